import { and, asc, eq, isNull, lte, sql } from '@vatside/db/sql';
import { viewerPaths } from '@vatside/contracts/dye-alongs';
import { dyeAlongs, mailOutbox, studioMembers, studios, user } from '@vatside/db/schema';
import type { AppDeps } from '../deps.ts';
import { dyeAlongCalendar } from '../mail/dye-along-calendar.ts';
import { dyeAlongMail } from '../mail/dye-along-mails.ts';
import { unsubscribeToken } from '../mail/unsubscribe-token.ts';
import { publicDyeAlong } from '../services/dye-along-view.ts';
import { REMINDER_LEAD_MS, type Tx } from './dye-along-mail-queue.ts';
import { processOneReviewMail } from './review-mail-delivery.ts';

// The mail job: works through the outbox table in PostgreSQL. Each row is claimed with
// SELECT … FOR UPDATE SKIP LOCKED inside a transaction that stays open while the mail is handed
// to SMTP and commits `sent_at` with it: two workers never take the same row, and a worker
// stopped mid-way leaves the row unsent (its transaction rolls back) for the next one. The one
// window left is a crash after SMTP accepted and before the commit; the Message-ID is fixed
// per row, so a repeat in that window is recognizably the same message.

export interface MailWorkerOptions {
  pollMs: number;
  batchSize: number;
  retryBaseMs: number;
  maxAttempts: number;
  /** False leaves the polling loop off, so a test can drive `runOnce` itself. */
  autoStart?: boolean;
}

export interface MailWorker {
  /** Processes due rows until none is left (or a batch is done); returns how many it handled. */
  runOnce(): Promise<number>;
  /** Finishes the mail in hand, then stops polling. */
  stop(): Promise<void>;
}

type OutboxRow = typeof mailOutbox.$inferSelect;

/** Exponential backoff, capped at six hours. */
export const retryDelayMs = (attempts: number, baseMs: number) =>
  Math.min(baseMs * 2 ** Math.max(0, attempts - 1), 6 * 3600_000);

export function startMailWorker(deps: AppDeps, options: MailWorkerOptions): MailWorker {
  const { db } = deps.database;
  const origin = deps.config.PUBLIC_ORIGIN;
  const originHost = new URL(origin).hostname;
  let stopped = false;
  let wake: (() => void) | null = null;

  const skip = (tx: Tx, row: OutboxRow, reason: string) =>
    tx
      .update(mailOutbox)
      .set({ skippedAt: sql`now()`, skipReason: reason })
      .where(eq(mailOutbox.id, row.id));

  /** Builds and sends one row's mail inside the claiming transaction. */
  async function deliver(tx: Tx, row: OutboxRow): Promise<void> {
    const [found] = await tx
      .select({
        dyeAlong: dyeAlongs,
        studio: studios,
        person: user,
        optIn: studioMembers.mailOptIn,
      })
      .from(dyeAlongs)
      .innerJoin(studios, eq(studios.id, dyeAlongs.studioId))
      .innerJoin(user, eq(user.id, row.recipientUserId))
      .leftJoin(
        studioMembers,
        and(eq(studioMembers.studioId, studios.id), eq(studioMembers.userId, row.recipientUserId)),
      )
      .where(eq(dyeAlongs.id, row.dyeAlongId));
    if (!found) return void (await skip(tx, row, 'gone'));
    const { dyeAlong, studio, person } = found;
    // Re-checked just before sending: an unsubscribe a second ago is honored.
    if (!found.optIn) return void (await skip(tx, row, 'optedOut'));
    const now = new Date();
    if (dyeAlong.status !== 'announced') return void (await skip(tx, row, 'withdrawn'));
    if (row.kind === 'reminder' && dyeAlong.startsAt <= now)
      return void (await skip(tx, row, 'stale'));

    try {
      await send(tx, row, { dyeAlong, studio, person, now });
    } catch (error) {
      // A mail that cannot be built or sent backs off; the row stays for a later attempt.
      const attempts = row.attempts + 1;
      const message = error instanceof Error ? error.message : String(error);
      deps.logger.warn({ outboxId: row.id, attempts, err: message }, 'mail not sent; will retry');
      await tx
        .update(mailOutbox)
        .set({
          attempts,
          lastError: message.slice(0, 500),
          ...(attempts >= options.maxAttempts
            ? { failedAt: sql`now()` }
            : { runAfter: new Date(Date.now() + retryDelayMs(attempts, options.retryBaseMs)) }),
        })
        .where(eq(mailOutbox.id, row.id));
    }
  }

  async function send(
    tx: Tx,
    row: OutboxRow,
    {
      dyeAlong,
      studio,
      person,
      now,
    }: {
      dyeAlong: typeof dyeAlongs.$inferSelect;
      studio: typeof studios.$inferSelect;
      person: typeof user.$inferSelect;
      now: Date;
    },
  ): Promise<void> {
    const view = await publicDyeAlong(db, { slug: studio.slug, name: studio.name }, dyeAlong, {
      weightOfGoodsG: person.defaultSkeinWeightG,
      system: person.unitSystem === 'metric' ? 'metric' : 'us',
      timeZone: person.timeZone,
    });
    const token = unsubscribeToken(deps.config.BETTER_AUTH_SECRET, {
      studioId: studio.id,
      userId: person.id,
    });
    const pageUrl = new URL(viewerPaths.dyeAlong(studio.slug, dyeAlong.id), origin).href;
    const mail = dyeAlongMail({
      kind: row.kind,
      to: person.email,
      recipientName: person.name,
      view,
      pageUrl,
      unsubscribePageUrl: new URL(viewerPaths.unsubscribe(token), origin).href,
      oneClickUrl: new URL(`/api/mail/unsubscribe?token=${token}`, origin).href,
      calendar: dyeAlongCalendar({
        dyeAlongId: dyeAlong.id,
        title: dyeAlong.title,
        studioName: studio.name,
        startsAt: dyeAlong.startsAt,
        expectedLengthMin: dyeAlong.expectedLengthMin,
        pageUrl,
        streamUrl: dyeAlong.streamUrl,
        sequence: Math.floor(dyeAlong.updatedAt.getTime() / 1000) % 2_000_000_000,
        originHost,
      }),
      messageId: `<outbox-${row.id}@${originHost}>`,
      includePrep:
        row.kind === 'announcement' &&
        dyeAlong.startsAt.getTime() - now.getTime() <= REMINDER_LEAD_MS,
    });
    const { messageId } = await deps.mailer.send(mail);
    await tx
      .update(mailOutbox)
      .set({ sentAt: sql`now()`, attempts: row.attempts + 1, messageId, lastError: null })
      .where(eq(mailOutbox.id, row.id));
  }

  /** Claims and handles one due row; false when none is due (or all are held by others). */
  function processOne(): Promise<boolean> {
    return db.transaction(async (tx) => {
      const [row] = await tx
        .select()
        .from(mailOutbox)
        .where(
          and(
            isNull(mailOutbox.sentAt),
            isNull(mailOutbox.skippedAt),
            isNull(mailOutbox.failedAt),
            lte(mailOutbox.runAfter, sql`now()`),
          ),
        )
        .orderBy(asc(mailOutbox.runAfter))
        .limit(1)
        .for('update', { skipLocked: true });
      if (!row) return false;
      await deliver(tx, row);
      return true;
    });
  }

  const reviewOptions = {
    maxAttempts: options.maxAttempts,
    retryDelayMs: (attempts: number) => retryDelayMs(attempts, options.retryBaseMs),
  };

  /** The sharers' review mails: their own outbox, handled by the same rules after each pass. */
  async function runReviewMails(): Promise<number> {
    let handled = 0;
    while (
      !stopped &&
      handled < options.batchSize &&
      (await processOneReviewMail(deps, reviewOptions))
    )
      handled++;
    return handled;
  }

  async function runOnce(): Promise<number> {
    let handled = 0;
    while (!stopped && handled < options.batchSize && (await processOne())) handled++;
    return handled;
  }

  const loop = (async () => {
    while (!stopped && options.autoStart !== false) {
      let handled = 0;
      try {
        handled = Math.max(await runOnce(), await runReviewMails());
      } catch (error) {
        deps.logger.error({ err: error }, 'mail worker pass failed');
      }
      // A full batch means more may be due: go on at once; otherwise wait for the next poll.
      if (!stopped && handled < options.batchSize) {
        await new Promise<void>((resolve) => {
          const timer = setTimeout(resolve, options.pollMs);
          wake = () => {
            clearTimeout(timer);
            resolve();
          };
        });
        wake = null;
      }
    }
  })();

  return {
    runOnce,
    async stop() {
      stopped = true;
      wake?.();
      await loop;
    },
  };
}
