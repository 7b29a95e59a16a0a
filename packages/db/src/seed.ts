import { demoStudios } from './demo-data.ts';
import type { Database } from './client.ts';
import { studios } from './schema.ts';

/** Inserts the invented demo data; running it again changes nothing. */
export async function seedDemo(db: Database): Promise<void> {
  for (const studio of demoStudios) {
    await db.insert(studios).values(studio).onConflictDoNothing({ target: studios.slug });
  }
}
