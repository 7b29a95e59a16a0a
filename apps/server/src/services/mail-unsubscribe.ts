import { and, eq } from '@vatside/db/sql';
import type { UnsubscribeResult } from '@vatside/contracts/mail-unsubscribe';
import type { Database } from '@vatside/db/client';
import { studioMembers, studios } from '@vatside/db/schema';
import { HttpError, notFound } from '../http/errors.ts';
import { skipQueuedFor } from '../jobs/dye-along-mail-queue.ts';
import { readUnsubscribeToken, type UnsubscribeClaim } from '../mail/unsubscribe-token.ts';

// One-click unsubscribe: the signed token names the person and the studio; no sign-in.

function claimOf(secret: string, token: string): UnsubscribeClaim {
  const claim = readUnsubscribeToken(secret, token);
  if (!claim) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'This unsubscribe link is not valid.', {
      token: ['The link was changed or cut short; use the one in the e-mail.'],
    });
  }
  return claim;
}

async function current(db: Database, claim: UnsubscribeClaim): Promise<UnsubscribeResult> {
  const [found] = await db
    .select({ slug: studios.slug, name: studios.name, optIn: studioMembers.mailOptIn })
    .from(studios)
    .leftJoin(
      studioMembers,
      and(eq(studioMembers.studioId, studios.id), eq(studioMembers.userId, claim.userId)),
    )
    .where(eq(studios.id, claim.studioId));
  if (!found) throw notFound('That studio');
  return { studio: { slug: found.slug, name: found.name }, mailOptIn: found.optIn ?? false };
}

/** What the link is for; changes nothing (mail scanners follow links with GET). */
export function describeUnsubscribe(db: Database, secret: string, token: string) {
  return current(db, claimOf(secret, token));
}

/** Stops the studio's e-mails to this person at once, including any already queued. */
export async function unsubscribe(
  db: Database,
  secret: string,
  token: string,
): Promise<UnsubscribeResult> {
  const claim = claimOf(secret, token);
  await db.transaction(async (tx) => {
    await tx
      .update(studioMembers)
      .set({ mailOptIn: false })
      .where(
        and(eq(studioMembers.studioId, claim.studioId), eq(studioMembers.userId, claim.userId)),
      );
    await skipQueuedFor(tx, claim.studioId, claim.userId);
  });
  return current(db, claim);
}
