import { randomUUID } from 'node:crypto';
import { and, asc, count, eq, inArray, isNotNull, isNull, sql } from '@vatside/db/sql';
import type {
  DyeAlong,
  DyeAlongDetail,
  DyeAlongList,
  DyeAlongStatus,
  dyeAlongCreateSchema,
  dyeAlongListQuerySchema,
  dyeAlongUpdateSchema,
} from '@vatside/contracts/dye-alongs';
import type { Database } from '@vatside/db/client';
import {
  colorways,
  dyeAlongColorways,
  dyeAlongs,
  images,
  mailOutbox,
  type StoredPrepItem,
} from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import {
  enqueueDyeAlongMails,
  rescheduleReminders,
  withdrawDyeAlongMails,
  type Tx,
} from '../jobs/dye-along-mail-queue.ts';
import { monthSnapshots, writeMonthSnapshots } from './archive-records.ts';
import { isUnderway, nextStatuses, transitionProblems } from './dye-along-rules.ts';
import { isoTimestamps, pageInfo, unknownReference } from './workbench-common.ts';
import { instantFromLocal, zonedTime } from './zoned-time.ts';

// Dye-alongs: the month's plan, its colorways in order, and its status. Drafts are seen by the
// host and moderators only; the route decides who asks, this module what they may see.

export type DyeAlongRow = typeof dyeAlongs.$inferSelect;
type CreateInput = z.output<typeof dyeAlongCreateSchema>;
type PatchInput = z.output<typeof dyeAlongUpdateSchema>;

interface ColorwayRef {
  id: string;
  name: string;
  technique: DyeAlong['colorways'][number]['technique'];
  position: number;
}

const inStudio = (studioId: string, id: string) =>
  and(eq(dyeAlongs.studioId, studioId), eq(dyeAlongs.id, id));

export async function colorwayRefs(db: Database | Tx, dyeAlongIds: string[]) {
  const byDyeAlong = new Map<string, ColorwayRef[]>();
  if (dyeAlongIds.length === 0) return byDyeAlong;
  const rows = await db
    .select({
      dyeAlongId: dyeAlongColorways.dyeAlongId,
      id: colorways.id,
      name: colorways.name,
      technique: colorways.technique,
      position: dyeAlongColorways.position,
    })
    .from(dyeAlongColorways)
    .innerJoin(colorways, eq(colorways.id, dyeAlongColorways.colorwayId))
    .where(inArray(dyeAlongColorways.dyeAlongId, dyeAlongIds))
    .orderBy(asc(dyeAlongColorways.position));
  for (const { dyeAlongId, ...ref } of rows) {
    byDyeAlong.set(dyeAlongId, [...(byDyeAlong.get(dyeAlongId) ?? []), ref]);
  }
  return byDyeAlong;
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

export function toDyeAlong(row: DyeAlongRow, refs: ColorwayRef[], now = new Date()): DyeAlong {
  return {
    id: row.id,
    studioId: row.studioId,
    title: row.title,
    description: row.description,
    status: row.status,
    startsAt: row.startsAt.toISOString(),
    timeZone: row.timeZone,
    startsAtHost: zonedTime(row.startsAt, row.timeZone),
    expectedLengthMin: row.expectedLengthMin,
    streamUrl: row.streamUrl,
    inspirationImageId: row.inspirationImageId,
    colorways: refs,
    shareOpensAt: iso(row.shareOpensAt),
    shareClosesAt: iso(row.shareClosesAt),
    hostPrepItems: row.hostPrepItems,
    statusChangedAt: row.statusChangedAt.toISOString(),
    announcedAt: iso(row.announcedAt),
    nextStatuses: nextStatuses(row.status, {
      title: row.title,
      startsAt: row.startsAt,
      colorwayCount: refs.length,
      now,
    }),
    ...isoTimestamps(row),
  };
}

export async function dyeAlongRow(db: Database | Tx, studioId: string, id: string) {
  const [row] = await db.select().from(dyeAlongs).where(inStudio(studioId, id));
  if (!row) throw notFound('That dye-along');
  return row;
}

/** A dye-along as a reader sees it; drafts are "not found" for anyone who may not see drafts. */
export async function visibleDyeAlongRow(
  db: Database,
  studioId: string,
  id: string,
  seesDrafts: boolean,
) {
  const row = await dyeAlongRow(db, studioId, id);
  if (row.status === 'draft' && !seesDrafts) throw notFound('That dye-along');
  return row;
}

export async function listDyeAlongs(
  db: Database,
  studioId: string,
  seesDrafts: boolean,
  query: z.output<typeof dyeAlongListQuerySchema>,
): Promise<DyeAlongList> {
  // The month as the calendar on the wall reads it: in the given zone, else the dye-along's own.
  const zone = query.timeZone ? sql`${query.timeZone}` : sql`${dyeAlongs.timeZone}`;
  const where = and(
    eq(dyeAlongs.studioId, studioId),
    seesDrafts ? undefined : sql`${dyeAlongs.status} <> 'draft'`,
    query.status ? eq(dyeAlongs.status, query.status) : undefined,
    query.month
      ? sql`to_char(${dyeAlongs.startsAt} at time zone ${zone}, 'YYYY-MM') = ${query.month}`
      : undefined,
  );
  const [rows, [total]] = await Promise.all([
    db
      .select()
      .from(dyeAlongs)
      .where(where)
      .orderBy(asc(dyeAlongs.startsAt), asc(dyeAlongs.id))
      .limit(query.limit)
      .offset(query.offset),
    db.select({ n: count() }).from(dyeAlongs).where(where),
  ]);
  const refs = await colorwayRefs(
    db,
    rows.map((r) => r.id),
  );
  return {
    items: rows.map((r) => toDyeAlong(r, refs.get(r.id) ?? [])),
    page: pageInfo(query, total?.n ?? 0),
  };
}

export async function getDyeAlong(
  db: Database,
  studioId: string,
  id: string,
): Promise<DyeAlongDetail> {
  const row = await dyeAlongRow(db, studioId, id);
  const refs = await colorwayRefs(db, [id]);
  const [mail] = await db
    .select({
      queued: sql<number>`count(*) filter (where ${mailOutbox.sentAt} is null and ${mailOutbox.skippedAt} is null and ${mailOutbox.failedAt} is null)::int`,
      sent: sql<number>`count(${mailOutbox.sentAt})::int`,
      skipped: sql<number>`count(${mailOutbox.skippedAt})::int`,
      failed: sql<number>`count(${mailOutbox.failedAt})::int`,
    })
    .from(mailOutbox)
    .where(eq(mailOutbox.dyeAlongId, id));
  return {
    ...toDyeAlong(row, refs.get(id) ?? []),
    mail: mail ?? { queued: 0, sent: 0, skipped: 0, failed: 0 },
  };
}

// ——— checks shared by create and edit ———

async function checkInspiration(db: Database | Tx, studioId: string, imageId: string | null) {
  if (!imageId) return;
  const [image] = await db
    .select({ purpose: images.purpose })
    .from(images)
    .where(and(eq(images.studioId, studioId), eq(images.id, imageId)));
  if (!image) throw unknownReference('inspirationImageId', 'image');
  if (image.purpose !== 'inspiration') {
    throw new HttpError(400, 'VALIDATION_FAILED', 'That image is not an inspiration image.', {
      inspirationImageId: ['Pick an image uploaded as inspiration.'],
    });
  }
}

async function checkColorways(db: Database | Tx, studioId: string, ids: string[]) {
  if (ids.length === 0) return;
  const found = await db
    .select({ id: colorways.id })
    .from(colorways)
    .where(and(eq(colorways.studioId, studioId), inArray(colorways.id, ids)));
  const known = new Set(found.map((c) => c.id));
  const missing = ids.findIndex((id) => !known.has(id));
  if (missing >= 0) throw unknownReference(`colorwayIds.${missing}`, 'colorway');
}

function checkShareWindow(opens: Date | null, closes: Date | null) {
  if (opens && closes && closes <= opens) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'The sharing window closes before it opens.', {
      shareClosesAt: ['Close the sharing window after it opens.'],
    });
  }
}

const prepItems = (
  items: { id?: string | undefined; text: string; when: StoredPrepItem['when'] }[],
) => items.map((i) => ({ id: i.id ?? randomUUID(), text: i.text, when: i.when }));

async function setColorways(tx: Tx, dyeAlongId: string, ids: string[]) {
  await tx.delete(dyeAlongColorways).where(eq(dyeAlongColorways.dyeAlongId, dyeAlongId));
  if (ids.length > 0) {
    await tx
      .insert(dyeAlongColorways)
      .values(ids.map((colorwayId, i) => ({ dyeAlongId, colorwayId, position: i + 1 })));
  }
}

export async function createDyeAlong(
  db: Database,
  studioId: string,
  userId: string,
  input: CreateInput,
): Promise<DyeAlongDetail> {
  const startsAt = input.startsAtLocal
    ? instantFromLocal(input.startsAtLocal, input.timeZone)
    : new Date(input.startsAt!);
  const shareOpensAt = input.shareOpensAt ? new Date(input.shareOpensAt) : null;
  const shareClosesAt = input.shareClosesAt ? new Date(input.shareClosesAt) : null;
  checkShareWindow(shareOpensAt, shareClosesAt);
  await checkInspiration(db, studioId, input.inspirationImageId);
  await checkColorways(db, studioId, input.colorwayIds);
  const id = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(dyeAlongs)
      .values({
        studioId,
        title: input.title,
        description: input.description,
        startsAt,
        timeZone: input.timeZone,
        expectedLengthMin: input.expectedLengthMin,
        streamUrl: input.streamUrl,
        inspirationImageId: input.inspirationImageId,
        shareOpensAt,
        shareClosesAt,
        hostPrepItems: prepItems(input.hostPrepItems),
        createdBy: userId,
      })
      .returning({ id: dyeAlongs.id });
    await setColorways(tx, row!.id, input.colorwayIds);
    return row!.id;
  });
  return getDyeAlong(db, studioId, id);
}

/** Locks the row for the rest of the transaction: edits and status changes never interleave. */
async function lockedRow(tx: Tx, studioId: string, id: string) {
  const [row] = await tx.select().from(dyeAlongs).where(inStudio(studioId, id)).for('update');
  if (!row) throw notFound('That dye-along');
  return row;
}

export async function updateDyeAlong(
  db: Database,
  studioId: string,
  id: string,
  patch: PatchInput,
  now = new Date(),
): Promise<DyeAlongDetail> {
  if (patch.inspirationImageId !== undefined)
    await checkInspiration(db, studioId, patch.inspirationImageId);
  if (patch.colorwayIds) await checkColorways(db, studioId, patch.colorwayIds);
  await db.transaction(async (tx) => {
    const row = await lockedRow(tx, studioId, id);
    if (row.status === 'archived') {
      throw new HttpError(409, 'CONFLICT', 'An archived dye-along is a record; it cannot change.');
    }
    const timeZone = patch.timeZone ?? row.timeZone;
    // A new zone alone keeps the host's wall-clock time ("2 PM") and moves the instant.
    const local =
      patch.startsAtLocal ??
      (patch.timeZone && !patch.startsAt ? zonedTime(row.startsAt, row.timeZone).local : undefined);
    const startsAt = local
      ? instantFromLocal(local, timeZone, patch.startsAtLocal ? 'startsAtLocal' : 'timeZone')
      : patch.startsAt
        ? new Date(patch.startsAt)
        : row.startsAt;
    const startMoved = startsAt.getTime() !== row.startsAt.getTime();
    if (isUnderway(row.status) && (startMoved || patch.timeZone || patch.colorwayIds)) {
      throw new HttpError(
        409,
        'CONFLICT',
        'It has gone live: its start and its colorways are part of the record now.',
      );
    }
    if (row.status === 'announced') {
      if (startMoved && startsAt <= now) {
        throw new HttpError(
          400,
          'VALIDATION_FAILED',
          'An announced dye-along starts in the future.',
          {
            startsAt: ['Pick a start in the future, or move it back to draft first.'],
          },
        );
      }
      if (patch.colorwayIds?.length === 0) {
        throw new HttpError(400, 'VALIDATION_FAILED', 'An announced dye-along needs a colorway.', {
          colorwayIds: ['Keep at least one colorway, or move it back to draft first.'],
        });
      }
    }
    const instant = (v: string | null | undefined, current: Date | null) =>
      v === undefined ? current : v === null ? null : new Date(v);
    const shareOpensAt = instant(patch.shareOpensAt, row.shareOpensAt);
    const shareClosesAt = instant(patch.shareClosesAt, row.shareClosesAt);
    checkShareWindow(shareOpensAt, shareClosesAt);
    await tx
      .update(dyeAlongs)
      .set({
        ...(patch.title !== undefined ? { title: patch.title } : {}),
        ...(patch.description !== undefined ? { description: patch.description } : {}),
        ...(patch.expectedLengthMin !== undefined
          ? { expectedLengthMin: patch.expectedLengthMin }
          : {}),
        ...(patch.streamUrl !== undefined ? { streamUrl: patch.streamUrl } : {}),
        ...(patch.inspirationImageId !== undefined
          ? { inspirationImageId: patch.inspirationImageId }
          : {}),
        ...(patch.hostPrepItems ? { hostPrepItems: prepItems(patch.hostPrepItems) } : {}),
        startsAt,
        timeZone,
        shareOpensAt,
        shareClosesAt,
      })
      .where(eq(dyeAlongs.id, id));
    if (patch.colorwayIds) await setColorways(tx, id, patch.colorwayIds);
    if (startMoved && row.status === 'announced') await rescheduleReminders(tx, id, startsAt, now);
  });
  return getDyeAlong(db, studioId, id);
}

/** Only a draft can be deleted; anything announced is part of the studio's history. */
export async function deleteDyeAlong(db: Database, studioId: string, id: string): Promise<void> {
  await db.transaction(async (tx) => {
    const row = await lockedRow(tx, studioId, id);
    if (row.status !== 'draft') {
      throw new HttpError(
        409,
        'CONFLICT',
        `Only a draft can be deleted; this one is ${row.status}. Archive it instead.`,
      );
    }
    await tx.delete(dyeAlongs).where(eq(dyeAlongs.id, id));
  });
}

/**
 * Moves a dye-along to `to`, or refuses with a 409 saying why. Announcing queues the e-mails in
 * the same transaction; going back to draft withdraws the ones not yet sent.
 */
export async function transitionDyeAlong(
  db: Database,
  studioId: string,
  id: string,
  to: DyeAlongStatus,
  now = new Date(),
): Promise<DyeAlongDetail> {
  // Archiving freezes each colorway's plan and dye log; read them first, write them with the status.
  const snapshots = to === 'archived' ? await monthSnapshots(db, studioId, id) : [];
  await db.transaction(async (tx) => {
    const row = await lockedRow(tx, studioId, id);
    const [counted] = await tx
      .select({ n: count() })
      .from(dyeAlongColorways)
      .where(eq(dyeAlongColorways.dyeAlongId, id));
    const problems = transitionProblems(row.status, to, {
      title: row.title,
      startsAt: row.startsAt,
      colorwayCount: counted?.n ?? 0,
      now,
    });
    if (problems.length > 0) {
      throw new HttpError(
        409,
        'CONFLICT',
        `It cannot move from ${row.status} to ${to}: ${problems.join(' ')}`,
        { to: problems },
      );
    }
    await tx
      .update(dyeAlongs)
      .set({
        status: to,
        statusChangedAt: now,
        ...(to === 'announced' ? { announcedAt: now } : {}),
        // Sharing opens when the host says so, unless they planned the window already.
        ...(to === 'sharing' && !row.shareOpensAt ? { shareOpensAt: now } : {}),
      })
      .where(eq(dyeAlongs.id, id));
    if (to === 'archived') await writeMonthSnapshots(tx, studioId, id, snapshots, now);
    if (to === 'announced') await enqueueDyeAlongMails(tx, row, now);
    if (row.status === 'announced' && to === 'draft') await withdrawDyeAlongMails(tx, id);
  });
  return getDyeAlong(db, studioId, id);
}

/** For tests and the seed: does this dye-along have mails that have not gone out? */
export async function pendingMailCount(db: Database, dyeAlongId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(mailOutbox)
    .where(
      and(
        eq(mailOutbox.dyeAlongId, dyeAlongId),
        isNull(mailOutbox.sentAt),
        isNull(mailOutbox.skippedAt),
        isNull(mailOutbox.failedAt),
      ),
    );
  return row?.n ?? 0;
}

/** Sent mails of one dye-along (tests read this back beside the catcher). */
export async function sentMailCount(db: Database, dyeAlongId: string): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(mailOutbox)
    .where(and(eq(mailOutbox.dyeAlongId, dyeAlongId), isNotNull(mailOutbox.sentAt)));
  return row?.n ?? 0;
}
