import { hashPassword } from 'better-auth/crypto';
import { connectDatabase } from '@vatside/db/client';
import { demoPassword, demoPeople } from '@vatside/db/demo-data';
import { seedDemo } from '@vatside/db/seed';
import { loadConfig } from './config.ts';

// Lives in the server package because demo passwords are hashed the way sign-in checks them.
const handle = connectDatabase(loadConfig().DATABASE_URL, 1);
try {
  await seedDemo(handle.db, { hashPassword });
} finally {
  await handle.close();
}

// Printed by `npm start` in its closing banner.
const lines = demoPeople.slice(0, 6).map((p) => {
  const roles = Object.entries(p.roles).map(([studio, role]) => `${role} of ${studio}`);
  return `    ${p.email.padEnd(30)} ${p.name.padEnd(16)} ${roles.join(', ')}`;
});
console.log(
  [
    `  Demo sign-ins (every one uses the password ${demoPassword}):`,
    ...lines,
    `    … and ${demoPeople.length - 6} more viewers (*@viewers.example)`,
  ].join('\n'),
);
