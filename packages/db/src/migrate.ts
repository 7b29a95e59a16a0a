import { fileURLToPath } from 'node:url';
import { migrate } from 'drizzle-orm/node-postgres/migrator';
import type { Database } from './client.ts';

const migrationsFolder = fileURLToPath(new URL('../migrations', import.meta.url));

/** Applies the committed SQL migrations; already applied ones are skipped. */
export async function migrateDatabase(db: Database): Promise<void> {
  await migrate(db, { migrationsFolder });
}
