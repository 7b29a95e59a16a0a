import { sql } from 'drizzle-orm';
import {
  boolean,
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
import { dyeAlongs } from './dye-along-schema.ts';
import { studios } from './schema.ts';
import { colorways, type FiberContentPart, type StoredSwatch } from './workbench-schema.ts';

// Sharing and review: viewers' skeins with their photos, the moderators' decisions (an audit
// that outlives a withdrawn share), the review e-mails' outbox, and the recap running order.

export const submissionStatus = pgEnum('submission_status', [
  'waiting',
  'approved',
  'featured',
  'needsChanges',
  'rejected',
]);

export const closenessBand = pgEnum('closeness_band', [
  'veryClose',
  'close',
  'sameFamily',
  'ownStory',
]);

/** A viewer's shared skein. Withdrawing deletes the row (and its photos' objects). */
export const submissions = pgTable(
  'submissions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    dyeAlongId: uuid('dye_along_id')
      .notNull()
      .references(() => dyeAlongs.id, { onDelete: 'cascade' }),
    sharerUserId: text('sharer_user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    /** The month's colorway that inspired it, if the sharer named one. */
    colorwayId: uuid('colorway_id').references(() => colorways.id, { onDelete: 'set null' }),
    baseName: varchar('base_name', { length: 120 }).notNull(),
    fiberContent: jsonb('fiber_content').$type<FiberContentPart[]>().notNull().default([]),
    dyesUsed: jsonb('dyes_used').$type<string[]>().notNull().default([]),
    notes: text('notes').notNull().default(''),
    /** Off until the sharer says yes; featuring needs it, revoking it unfeatures. */
    consentToFeature: boolean('consent_to_feature').notNull().default(false),
    status: submissionStatus('status').notNull().default('waiting'),
    /** The moderator's words for needs-changes and rejections; shown to the sharer. */
    reason: text('reason'),
    /** Queue order: set when shared and again when an edit sends it back for review. */
    waitingSince: timestamp('waiting_since', { withTimezone: true }).notNull().defaultNow(),
    /** Main colors of the marked yarn areas (all photos together). */
    yarnPalette: jsonb('yarn_palette').$type<StoredSwatch[]>().notNull().default([]),
    /** Kind band against the month's inspiration; null when the month has no palette. */
    closenessBand: closenessBand('closeness_band'),
    closenessMessage: text('closeness_message'),
    createdAt: createdAt(),
    updatedAt: updatedAt(),
  },
  (t) => [
    index('submissions_queue_idx').on(t.studioId, t.status, t.waitingSince),
    index('submissions_dye_along_idx').on(t.dyeAlongId, t.status, t.createdAt),
    index('submissions_sharer_idx').on(t.sharerUserId, t.createdAt),
  ],
);

/** The yarn area on a photo, as fractions of the oriented web rendition. */
export interface YarnCrop {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** One photo of a share: only the pipeline's re-encoded renditions are stored. */
export const submissionPhotos = pgTable(
  'submission_photos',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    submissionId: uuid('submission_id')
      .notNull()
      .references(() => submissions.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    webKey: text('web_key').notNull().unique(),
    thumbKey: text('thumb_key').notNull().unique(),
    contentType: varchar('content_type', { length: 40 }).notNull(),
    width: integer('width').notNull(),
    height: integer('height').notNull(),
    bytes: integer('bytes').notNull(),
    thumbWidth: integer('thumb_width').notNull(),
    thumbHeight: integer('thumb_height').notNull(),
    yarnCrop: jsonb('yarn_crop').$type<YarnCrop>().notNull(),
    createdAt: createdAt(),
  },
  (t) => [index('submission_photos_submission_idx').on(t.submissionId, t.position)],
);

export const reviewAction = pgEnum('review_action', [
  'approve',
  'needsChanges',
  'reject',
  'feature',
  'unfeature',
]);

/**
 * Every review decision, who made it and when. `submissionId` is deliberately not a foreign
 * key: the record stays after the sharer withdraws the skein.
 */
export const reviewDecisions = pgTable(
  'review_decisions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    dyeAlongId: uuid('dye_along_id')
      .notNull()
      .references(() => dyeAlongs.id, { onDelete: 'cascade' }),
    submissionId: uuid('submission_id').notNull(),
    action: reviewAction('action').notNull(),
    fromStatus: submissionStatus('from_status').notNull(),
    toStatus: submissionStatus('to_status').notNull(),
    reason: text('reason'),
    actorUserId: text('actor_user_id').references(() => user.id, { onDelete: 'set null' }),
    createdAt: createdAt(),
  },
  (t) => [
    index('review_decisions_studio_idx').on(t.studioId, t.createdAt),
    index('review_decisions_submission_idx').on(t.submissionId, t.createdAt),
  ],
);

export const reviewMailKind = pgEnum('review_mail_kind', ['approved', 'needsChanges', 'featured']);

/**
 * One e-mail about one decision, written in the decision's transaction. The mail job claims a
 * row with FOR UPDATE SKIP LOCKED and marks it sent in the same transaction as the send.
 */
export const reviewMailOutbox = pgTable(
  'review_mail_outbox',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    kind: reviewMailKind('kind').notNull(),
    decisionId: uuid('decision_id')
      .notNull()
      .references(() => reviewDecisions.id, { onDelete: 'cascade' }),
    /** Withdrawing the skein deletes its unsent mails with it. */
    submissionId: uuid('submission_id')
      .notNull()
      .references(() => submissions.id, { onDelete: 'cascade' }),
    recipientUserId: text('recipient_user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    runAfter: timestamp('run_after', { withTimezone: true }).notNull().defaultNow(),
    attempts: integer('attempts').notNull().default(0),
    lastError: text('last_error'),
    messageId: text('message_id'),
    sentAt: timestamp('sent_at', { withTimezone: true }),
    /** 'optedOut', or 'superseded' when a later decision changed the status again. */
    skippedAt: timestamp('skipped_at', { withTimezone: true }),
    skipReason: varchar('skip_reason', { length: 20 }),
    failedAt: timestamp('failed_at', { withTimezone: true }),
    createdAt: createdAt(),
  },
  (t) => [
    uniqueIndex('review_mail_outbox_decision_idx').on(t.decisionId),
    index('review_mail_outbox_due_idx')
      .on(t.runAfter)
      .where(sql`${t.sentAt} is null and ${t.skippedAt} is null and ${t.failedAt} is null`),
  ],
);

/** A person who asked for no review e-mails from a studio (one-click unsubscribe). */
export const reviewMailOptOuts = pgTable(
  'review_mail_opt_outs',
  {
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ columns: [t.studioId, t.userId] })],
);

/**
 * The recap running order: featured skeins and the month's colorways, each with a note for the
 * host to say on camera. A withdrawn skein's item goes with it (cascade).
 */
export const recapItems = pgTable(
  'recap_items',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    dyeAlongId: uuid('dye_along_id')
      .notNull()
      .references(() => dyeAlongs.id, { onDelete: 'cascade' }),
    position: integer('position').notNull(),
    submissionId: uuid('submission_id').references(() => submissions.id, { onDelete: 'cascade' }),
    colorwayId: uuid('colorway_id').references(() => colorways.id, { onDelete: 'cascade' }),
    note: text('note').notNull().default(''),
    createdAt: createdAt(),
  },
  (t) => [
    index('recap_items_order_idx').on(t.dyeAlongId, t.position),
    uniqueIndex('recap_items_submission_idx').on(t.dyeAlongId, t.submissionId),
    uniqueIndex('recap_items_colorway_idx').on(t.dyeAlongId, t.colorwayId),
    check('recap_items_one_subject', sql`num_nonnulls(${t.submissionId}, ${t.colorwayId}) = 1`),
  ],
);
