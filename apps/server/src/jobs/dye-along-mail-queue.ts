import { and, eq, inArray, isNull, sql } from '@vatside/db/sql';
import type { Database } from '@vatside/db/client';
import { dyeAlongs, mailOutbox, studioMembers } from '@vatside/db/schema';

// Writing to the outbox, always inside the caller's transaction: the mails exist exactly when
// the status change that caused them is committed.

export type Tx = Parameters<Parameters<Database['transaction']>[0]>[0];

/** The reminder goes out this long before the start (the day before). */
export const REMINDER_LEAD_MS = 24 * 3600_000;

/** When the reminder for a start is due, or null when that moment has already passed. */
export function reminderDueAt(startsAt: Date, now: Date): Date | null {
  const due = new Date(startsAt.getTime() - REMINDER_LEAD_MS);
  return due > now ? due : null;
}

/**
 * Queues the announcement (now) and the reminder (the day before) for every member who asked
 * for the studio's e-mails. The unique (kind, dye-along, recipient) key makes this idempotent;
 * a row withdrawn earlier and never sent is revived, one already sent is left alone.
 */
export async function enqueueDyeAlongMails(
  tx: Tx,
  dyeAlong: { id: string; studioId: string; startsAt: Date },
  now: Date,
): Promise<number> {
  const recipients = await tx
    .select({ userId: studioMembers.userId })
    .from(studioMembers)
    .where(and(eq(studioMembers.studioId, dyeAlong.studioId), eq(studioMembers.mailOptIn, true)));
  if (recipients.length === 0) return 0;
  const reminderAt = reminderDueAt(dyeAlong.startsAt, now);
  const rows = recipients.flatMap(({ userId }) => [
    {
      kind: 'announcement' as const,
      dyeAlongId: dyeAlong.id,
      recipientUserId: userId,
      runAfter: now,
    },
    ...(reminderAt
      ? [
          {
            kind: 'reminder' as const,
            dyeAlongId: dyeAlong.id,
            recipientUserId: userId,
            runAfter: reminderAt,
          },
        ]
      : []),
  ]);
  await tx
    .insert(mailOutbox)
    .values(rows)
    .onConflictDoUpdate({
      target: [mailOutbox.kind, mailOutbox.dyeAlongId, mailOutbox.recipientUserId],
      set: {
        runAfter: sql`excluded.run_after`,
        skippedAt: null,
        skipReason: null,
        failedAt: null,
        attempts: 0,
      },
      setWhere: isNull(mailOutbox.sentAt),
    });
  return recipients.length;
}

/** Back to draft: mails not yet sent are withdrawn (they stay as a record). */
export async function withdrawDyeAlongMails(tx: Tx, dyeAlongId: string): Promise<void> {
  await tx
    .update(mailOutbox)
    .set({ skippedAt: sql`now()`, skipReason: 'withdrawn' })
    .where(
      and(
        eq(mailOutbox.dyeAlongId, dyeAlongId),
        isNull(mailOutbox.sentAt),
        isNull(mailOutbox.skippedAt),
      ),
    );
}

/** A new start moves the reminders still waiting. */
export async function rescheduleReminders(tx: Tx, dyeAlongId: string, startsAt: Date, now: Date) {
  const due = reminderDueAt(startsAt, now);
  const waiting = and(
    eq(mailOutbox.dyeAlongId, dyeAlongId),
    eq(mailOutbox.kind, 'reminder'),
    isNull(mailOutbox.sentAt),
    isNull(mailOutbox.skippedAt),
  );
  if (due) await tx.update(mailOutbox).set({ runAfter: due }).where(waiting);
  else await tx.update(mailOutbox).set({ skippedAt: now, skipReason: 'stale' }).where(waiting);
}

/** Someone unsubscribed: nothing still queued for them from this studio goes out. */
export async function skipQueuedFor(db: Database | Tx, studioId: string, userId: string) {
  const studioDyeAlongs = db
    .select({ id: dyeAlongs.id })
    .from(dyeAlongs)
    .where(eq(dyeAlongs.studioId, studioId));
  await db
    .update(mailOutbox)
    .set({ skippedAt: sql`now()`, skipReason: 'optedOut' })
    .where(
      and(
        eq(mailOutbox.recipientUserId, userId),
        inArray(mailOutbox.dyeAlongId, studioDyeAlongs),
        isNull(mailOutbox.sentAt),
        isNull(mailOutbox.skippedAt),
      ),
    );
}
