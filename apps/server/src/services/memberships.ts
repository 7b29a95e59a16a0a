import { and, asc, count, eq, sql } from '@vatside/db/sql';
import type { Member } from '@vatside/contracts/members';
import type { StudioRole, StudioStanding } from '@vatside/contracts/roles';
import type { Database } from '@vatside/db/client';
import { studioMembers, studios, user } from '@vatside/db/schema';
import { HttpError } from '../http/errors.ts';

type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** Following makes a visitor a viewer; members who already help keep their role. */
export async function follow(
  db: Database,
  studioId: string,
  userId: string,
  mailOptIn: boolean,
): Promise<void> {
  await db
    .insert(studioMembers)
    .values({ studioId, userId, role: 'viewer', mailOptIn })
    .onConflictDoUpdate({
      target: [studioMembers.studioId, studioMembers.userId],
      set: { mailOptIn },
    });
}

export async function unfollow(
  db: Database,
  studioId: string,
  userId: string,
  standing: StudioStanding,
): Promise<void> {
  if (standing === 'visitor') return;
  if (standing !== 'viewer') {
    throw new HttpError(
      409,
      'CONFLICT',
      'You help run this studio; ask its host to change your role first.',
    );
  }
  await db
    .delete(studioMembers)
    .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId)));
}

export async function listMembers(db: Database, studioId: string): Promise<Member[]> {
  const rows = await db
    .select({
      userId: studioMembers.userId,
      name: user.name,
      email: user.email,
      role: studioMembers.role,
      mailOptIn: studioMembers.mailOptIn,
      joinedAt: studioMembers.joinedAt,
    })
    .from(studioMembers)
    .innerJoin(user, eq(user.id, studioMembers.userId))
    .where(eq(studioMembers.studioId, studioId))
    .orderBy(asc(user.name));
  return rows.map((r) => ({ ...r, joinedAt: r.joinedAt.toISOString() }));
}

/** Locks the studio's member rows so two hosts demoting each other cannot leave it hostless. */
async function lockedMember(tx: Tx, studioId: string, userId: string) {
  await tx.execute(
    sql`select 1 from ${studioMembers} where ${studioMembers.studioId} = ${studioId} for update`,
  );
  const [member] = await tx
    .select({ role: studioMembers.role })
    .from(studioMembers)
    .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId)));
  if (!member) throw new HttpError(404, 'NOT_FOUND', 'That person is not a member of this studio.');
  return member;
}

async function hostCount(tx: Tx, studioId: string): Promise<number> {
  const [row] = await tx
    .select({ n: count() })
    .from(studioMembers)
    .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.role, 'host')));
  return row?.n ?? 0;
}

const lastHostError = () =>
  new HttpError(409, 'CONFLICT', 'A studio always keeps a host. Make someone else a host first.');

export async function changeRole(
  db: Database,
  studioId: string,
  userId: string,
  role: StudioRole,
): Promise<void> {
  await db.transaction(async (tx) => {
    const member = await lockedMember(tx, studioId, userId);
    if (member.role === 'host' && role !== 'host' && (await hostCount(tx, studioId)) <= 1)
      throw lastHostError();
    await tx
      .update(studioMembers)
      .set({ role })
      .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId)));
  });
}

export async function removeMember(db: Database, studioId: string, userId: string): Promise<void> {
  await db.transaction(async (tx) => {
    const member = await lockedMember(tx, studioId, userId);
    if (member.role === 'host' && (await hostCount(tx, studioId)) <= 1) throw lastHostError();
    await tx
      .delete(studioMembers)
      .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId)));
  });
}

/** Names of the studios where this person is the only host (they cannot simply leave). */
export async function soleHostedStudios(db: Database, userId: string): Promise<string[]> {
  const hosted = await db
    .select({ id: studios.id, name: studios.name })
    .from(studioMembers)
    .innerJoin(studios, eq(studios.id, studioMembers.studioId))
    .where(and(eq(studioMembers.userId, userId), eq(studioMembers.role, 'host')));
  const sole: string[] = [];
  for (const studio of hosted) {
    const [row] = await db
      .select({ n: count() })
      .from(studioMembers)
      .where(and(eq(studioMembers.studioId, studio.id), eq(studioMembers.role, 'host')));
    if ((row?.n ?? 0) <= 1) sole.push(studio.name);
  }
  return sole;
}

export async function membershipsOf(db: Database, userId: string) {
  return db
    .select({
      studio: {
        id: studios.id,
        slug: studios.slug,
        name: studios.name,
        tagline: studios.tagline,
        accentHex: studios.accentHex,
      },
      role: studioMembers.role,
      mailOptIn: studioMembers.mailOptIn,
    })
    .from(studioMembers)
    .innerJoin(studios, eq(studios.id, studioMembers.studioId))
    .where(eq(studioMembers.userId, userId))
    .orderBy(asc(studios.name));
}
