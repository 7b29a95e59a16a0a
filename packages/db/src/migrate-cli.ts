import { connectDatabase } from './client.ts';
import { migrateDatabase } from './migrate.ts';

const url = process.env.DATABASE_URL;
if (!url) throw new Error('DATABASE_URL is not set');
const handle = connectDatabase(url, 1);
try {
  await migrateDatabase(handle.db);
  console.log('[vatside] migrations applied');
} finally {
  await handle.close();
}
