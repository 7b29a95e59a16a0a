import { asc } from 'drizzle-orm';
import { studios } from '@vatside/db/schema';
import type { StudioSummary } from '@vatside/contracts/studios';
import type { Database } from '@vatside/db/client';

export async function listStudios(db: Database, limit: number): Promise<StudioSummary[]> {
  return db
    .select({
      id: studios.id,
      slug: studios.slug,
      name: studios.name,
      tagline: studios.tagline,
      accentHex: studios.accentHex,
    })
    .from(studios)
    .orderBy(asc(studios.name))
    .limit(limit);
}
