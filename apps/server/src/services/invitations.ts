import { createHash, randomBytes } from 'node:crypto';
import { and, desc, eq, isNull } from '@vatside/db/sql';
import type { Invitation, InvitationPreview, InvitationStatus } from '@vatside/contracts/members';
import type { Database } from '@vatside/db/client';
import { studioInvitations, studioMembers, studios } from '@vatside/db/schema';
import { HttpError } from '../http/errors.ts';

const validForMs = 7 * 24 * 60 * 60 * 1000;

// Only a hash is stored, so a leaked database row cannot be turned into a working link.
const hashToken = (token: string) => createHash('sha256').update(token).digest('hex');

type InvitationRow = typeof studioInvitations.$inferSelect;

function statusOf(row: InvitationRow, now = new Date()): InvitationStatus {
  if (row.acceptedAt) return 'accepted';
  if (row.revokedAt) return 'revoked';
  if (row.expiresAt <= now) return 'expired';
  return 'waiting';
}

const toInvitation = (row: InvitationRow): Invitation => ({
  id: row.id,
  email: row.email,
  role: row.role,
  status: statusOf(row),
  createdAt: row.createdAt.toISOString(),
  expiresAt: row.expiresAt.toISOString(),
});

export async function createInvitation(
  db: Database,
  studioId: string,
  email: string,
  invitedBy: string,
): Promise<{ invitation: Invitation; token: string }> {
  const token = randomBytes(32).toString('base64url');
  const [row] = await db
    .insert(studioInvitations)
    .values({
      studioId,
      email,
      role: 'moderator',
      tokenHash: hashToken(token),
      invitedBy,
      expiresAt: new Date(Date.now() + validForMs),
    })
    .returning();
  if (!row) throw new Error('Invitation insert returned nothing');
  return { invitation: toInvitation(row), token };
}

export async function deleteInvitation(db: Database, invitationId: string): Promise<void> {
  await db.delete(studioInvitations).where(eq(studioInvitations.id, invitationId));
}

export async function listInvitations(db: Database, studioId: string): Promise<Invitation[]> {
  const rows = await db
    .select()
    .from(studioInvitations)
    .where(eq(studioInvitations.studioId, studioId))
    .orderBy(desc(studioInvitations.createdAt));
  return rows.map(toInvitation);
}

export async function revokeInvitation(
  db: Database,
  studioId: string,
  invitationId: string,
): Promise<void> {
  const revoked = await db
    .update(studioInvitations)
    .set({ revokedAt: new Date() })
    .where(
      and(
        eq(studioInvitations.id, invitationId),
        eq(studioInvitations.studioId, studioId),
        isNull(studioInvitations.acceptedAt),
        isNull(studioInvitations.revokedAt),
      ),
    )
    .returning({ id: studioInvitations.id });
  if (revoked.length === 0)
    throw new HttpError(404, 'NOT_FOUND', 'No open invitation with that id in this studio.');
}

export async function previewInvitation(db: Database, token: string): Promise<InvitationPreview> {
  const [found] = await db
    .select({ invitation: studioInvitations, studio: studios })
    .from(studioInvitations)
    .innerJoin(studios, eq(studios.id, studioInvitations.studioId))
    .where(eq(studioInvitations.tokenHash, hashToken(token)));
  if (!found) throw new HttpError(404, 'NOT_FOUND', 'This invitation link is not valid.');
  const { studio, invitation } = found;
  return {
    studio: {
      id: studio.id,
      slug: studio.slug,
      name: studio.name,
      tagline: studio.tagline,
      accentHex: studio.accentHex,
    },
    role: invitation.role,
    email: invitation.email,
    status: statusOf(invitation),
  };
}

/** Accepting works once, only for the invited address; a host who accepts stays host. */
export async function acceptInvitation(
  db: Database,
  token: string,
  person: { id: string; email: string },
): Promise<{ studioId: string; studioSlug: string }> {
  return db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(studioInvitations)
      .where(eq(studioInvitations.tokenHash, hashToken(token)))
      .for('update');
    if (!row) throw new HttpError(404, 'NOT_FOUND', 'This invitation link is not valid.');
    const status = statusOf(row);
    if (status !== 'waiting')
      throw new HttpError(409, 'CONFLICT', `This invitation was already ${status}.`);
    if (row.email.toLowerCase() !== person.email.toLowerCase()) {
      throw new HttpError(
        403,
        'FORBIDDEN',
        `This invitation is for ${row.email}; sign in with that address.`,
      );
    }
    const [current] = await tx
      .select({ role: studioMembers.role })
      .from(studioMembers)
      .where(and(eq(studioMembers.studioId, row.studioId), eq(studioMembers.userId, person.id)));
    if (current?.role !== 'host') {
      await tx
        .insert(studioMembers)
        .values({ studioId: row.studioId, userId: person.id, role: row.role })
        .onConflictDoUpdate({
          target: [studioMembers.studioId, studioMembers.userId],
          set: { role: row.role },
        });
    }
    await tx
      .update(studioInvitations)
      .set({ acceptedAt: new Date() })
      .where(eq(studioInvitations.id, row.id));
    const [studio] = await tx
      .select({ slug: studios.slug })
      .from(studios)
      .where(eq(studios.id, row.studioId));
    return { studioId: row.studioId, studioSlug: studio?.slug ?? '' };
  });
}
