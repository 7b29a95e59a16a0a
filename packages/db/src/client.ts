import { drizzle, type NodePgDatabase } from 'drizzle-orm/node-postgres';
import pg from 'pg';
import * as schema from './schema.ts';

export type Database = NodePgDatabase<typeof schema>;

export interface DatabaseHandle {
  db: Database;
  pool: pg.Pool;
  close: () => Promise<void>;
}

export function connectDatabase(databaseUrl: string, maxConnections = 10): DatabaseHandle {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: maxConnections });
  const db = drizzle(pool, { schema });
  return { db, pool, close: () => pool.end() };
}
