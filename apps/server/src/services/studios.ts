import { and, asc, count, eq } from '@vatside/db/sql';
import type { StudioCreate, StudioDetail, StudioSummary } from '@vatside/contracts/studios';
import type { StudioStanding } from '@vatside/contracts/roles';
import type { Database } from '@vatside/db/client';
import { studioMembers, studios, user } from '@vatside/db/schema';
import { HttpError } from '../http/errors.ts';

const summaryColumns = {
  id: studios.id,
  slug: studios.slug,
  name: studios.name,
  tagline: studios.tagline,
  accentHex: studios.accentHex,
};

export async function listStudios(db: Database, limit: number): Promise<StudioSummary[]> {
  return db.select(summaryColumns).from(studios).orderBy(asc(studios.name)).limit(limit);
}

/** Creates a studio with its creator as host, in one transaction. */
export async function createStudio(
  db: Database,
  hostUserId: string,
  input: StudioCreate,
): Promise<StudioSummary> {
  return db.transaction(async (tx) => {
    const [created] = await tx
      .insert(studios)
      .values(input)
      .onConflictDoNothing({ target: studios.slug })
      .returning(summaryColumns);
    if (!created)
      throw new HttpError(409, 'CONFLICT', `The address "${input.slug}" is taken; choose another.`);
    await tx
      .insert(studioMembers)
      .values({ studioId: created.id, userId: hostUserId, role: 'host' });
    return created;
  });
}

export async function studioDetail(
  db: Database,
  studio: StudioSummary,
  standing: StudioStanding,
  userId: string | undefined,
): Promise<StudioDetail> {
  const hosts = await db
    .select({ name: user.name })
    .from(studioMembers)
    .innerJoin(user, eq(user.id, studioMembers.userId))
    .where(and(eq(studioMembers.studioId, studio.id), eq(studioMembers.role, 'host')))
    .orderBy(asc(user.name));
  const [followers] = await db
    .select({ n: count() })
    .from(studioMembers)
    .where(and(eq(studioMembers.studioId, studio.id), eq(studioMembers.role, 'viewer')));
  let mailOptIn = false;
  if (userId) {
    const [me] = await db
      .select({ mailOptIn: studioMembers.mailOptIn })
      .from(studioMembers)
      .where(and(eq(studioMembers.studioId, studio.id), eq(studioMembers.userId, userId)));
    mailOptIn = me?.mailOptIn ?? false;
  }
  return {
    id: studio.id,
    slug: studio.slug,
    name: studio.name,
    tagline: studio.tagline,
    accentHex: studio.accentHex,
    hostNames: hosts.map((h) => h.name),
    followerCount: followers?.n ?? 0,
    myRole: standing,
    mailOptIn,
  };
}
