import { connectDatabase } from './client.ts';
import { seedDemo } from './seed.ts';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is not set');
const handle = connectDatabase(url, 1);
try {
  await seedDemo(handle.db);
  console.log('[vatside] demo data in place');
} finally {
  await handle.close();
}
