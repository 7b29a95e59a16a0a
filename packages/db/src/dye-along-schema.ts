import { sql } from 'drizzle-orm';
import {
  check,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { createdAt, updatedAt } from './columns.ts';
import { user } from './auth-schema.ts';
import { studios } from './schema.ts';
import { colorways, images } from './workbench-schema.ts';

// The month's dye-along: its schedule and lifecycle, the colorways it dyes, and the e-mails
// it sends (an outbox the mail job works through, so a restart neither loses nor repeats one).

export const dyeAlongStatus = pgEnum('dye_along_status', [
  'draft',
  'announced',
  'live',
  'sharing',
  'recap',
  'archived',
]);

export interface StoredPrepItem {
  id: string;
  text: string;
  when: 'dayBefore' | 'hourBefore';
}

export const dyeAlongs = pgTable(
  'dye_alongs',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    title: varchar('title', { length: 120 }).notNull(),
    description: text('description').notNull().default(''),
    /** The instant it starts (UTC); `timeZone` is the host's zone, for the month and the mails. */
    startsAt: timestamp('starts_at', { withTimezone: true }).notNull(),
    timeZone: varchar('time_zone', { length: 64 }).notNull(),
    expectedLengthMin: integer('expected_length_min').notNull(),
    streamUrl: text('stream_url'),
    inspirationImageId: uuid('inspiration_image_id').references(() => images.id, {
      onDelete: 'set null',
    }),
    /** When viewers may share photos of their skeins. */
    shareOpensAt: timestamp('share_opens_at', { withTimezone: true }),
    shareClosesAt: timestamp('share_closes_at', { withTimezone: true }),
    hostPrepItems: jsonb('host_prep_items').$type<StoredPrepItem[]>().notNull().default([]),
    status: dyeAlongStatus('status').notNull().default('draft'),
    statusChangedAt: timestamp('status_changed_at', { withTimezone: true }).notNull().defaultNow(),
    announcedAt: timestamp('announced_at', { withTimezone: true }),
    createdBy: text('created_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('dye_alongs_studio_idx').on(t.studioId, t.startsAt),
    check('dye_alongs_length_range', sql`${t.expectedLengthMin} between 1 and 1440`),
    check(
      'dye_alongs_share_window',
      sql`${t.shareClosesAt} is null or ${t.shareOpensAt} is null or ${t.shareClosesAt} > ${t.shareOpensAt}`,
    ),
  ],
);

/** The month's colorways, in the order the host dyes them. */
export const dyeAlongColorways = pgTable(
  'dye_along_colorways',
  {
    dyeAlongId: uuid('dye_along_id')
      .notNull()
      .references(() => dyeAlongs.id, { onDelete: 'cascade' }),
    colorwayId: uuid('colorway_id')
      .notNull()
      .references(() => colorways.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
  },
  (t) => [
    primaryKey({ columns: [t.dyeAlongId, t.colorwayId] }),
    index('dye_along_colorways_colorway_idx').on(t.colorwayId),
  ],
);

export const mailKind = pgEnum('mail_kind', ['announcement', 'reminder']);

/**
 * One e-mail to one person about one dye-along. The unique (kind, dye-along, recipient) key
 * means enqueueing twice is harmless; the worker claims a row with FOR UPDATE SKIP LOCKED and
 * sets `sent_at` in the same transaction as the send, so a row is sent once or not at all.
 */
export const mailOutbox = pgTable(
  'mail_outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kind: mailKind('kind').notNull(),
    dyeAlongId: uuid('dye_along_id')
      .notNull()
      .references(() => dyeAlongs.id, { onDelete: 'cascade' }),
    recipientUserId: text('recipient_user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    /** Not sent before this instant (reminders wait for the day before; retries back off). */
    runAfter: timestamp('run_after', { withTimezone: true }).notNull().defaultNow(),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    messageId: text('message_id'),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    /** Not sent on purpose: 'optedOut', 'withdrawn' (back to draft), 'stale' (too late). */
    skippedAt: timestamp('skipped_at', { withTimezone: true }),
    skipReason: varchar('skip_reason', { length: 20 }),
    /** Gave up after the last attempt. */
    failedAt: timestamp('failed_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('mail_outbox_dedupe_idx').on(t.kind, t.dyeAlongId, t.recipientUserId),
    index('mail_outbox_due_idx')
      .on(t.runAfter)
      .where(sql`${t.sentAt} is null and ${t.skippedAt} is null and ${t.failedAt} is null`),
  ],
);
