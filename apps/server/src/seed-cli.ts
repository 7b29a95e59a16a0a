import { hashPassword } from 'better-auth/crypto';
import { connectDatabase } from '@vatside/db/client';
import { demoPassword, demoPeople } from '@vatside/db/demo-data';
import { seedDemo } from '@vatside/db/seed';
import { loadConfig } from './config.ts';
import { seedPastMonth } from './seed/past-month.ts';
import { seedTidePool } from './seed/tide-pool.ts';
import { seedTidePoolShares } from './seed/tide-pool-shares.ts';
import { createObjectStore } from './storage/object-store.ts';

// Lives in the server package because demo passwords are hashed the way sign-in checks them,
// and the tide-pool month's image goes through the server's upload pipeline.
const config = loadConfig();
const handle = connectDatabase(config.DATABASE_URL, 1);
const objectStore = createObjectStore(config);
try {
  await seedDemo(handle.db, { hashPassword });
  await seedTidePool({ db: handle.db, objectStore, maxPixels: config.UPLOAD_MAX_PIXELS });
  await seedPastMonth({ db: handle.db, objectStore, maxPixels: config.UPLOAD_MAX_PIXELS });
  await seedTidePoolShares({ db: handle.db, objectStore, maxPixels: config.UPLOAD_MAX_PIXELS });
} finally {
  objectStore.close();
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
