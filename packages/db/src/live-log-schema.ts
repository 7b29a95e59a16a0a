import { sql } from 'drizzle-orm';
import {
  type AnyPgColumn,
  boolean,
  check,
  doublePrecision,
  index,
  integer,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { user } from './auth-schema.ts';
import { liveSessions } from './live-schema.ts';
import { stockSolutions } from './workbench-schema.ts';

// What happens beside the pots during a live session: the dye log and the question queue.
// Both hang off the session, so a rehearsal's log and questions go when the rehearsal does.

export const dyeLogUnit = pgEnum('dye_log_unit', ['mL', 'drop', 'gGel']);
export const dyeLogKind = pgEnum('dye_log_kind', ['stock', 'foodColor']);

/**
 * One record of what went into a pot. Never updated: a correction is a new row that supersedes
 * it (unique, so two corrections of one entry cannot both land), and voiding is a correction to
 * zero. `jarChangeMl` is what this row did to the jar, so the shelf's history adds up.
 */
export const dyeLogEntries = pgTable(
  'dye_log_entries',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    sessionId: uuid('session_id')
      .notNull()
      .references(() => liveSessions.id, { onDelete: 'cascade' }),
    /** The pot (the colorway's id in the session's program) and its recipe line. */
    potId: uuid('pot_id').notNull(),
    recipeLineId: uuid('recipe_line_id').notNull(),
    kind: dyeLogKind('kind').notNull(),
    name: varchar('name', { length: 80 }).notNull(),
    amount: doublePrecision('amount').notNull(),
    unit: dyeLogUnit('unit').notNull(),
    plannedAmount: doublePrecision('planned_amount').notNull(),
    asPlanned: boolean('as_planned').notNull(),
    stockSolutionId: uuid('stock_solution_id').references(() => stockSolutions.id, {
      onDelete: 'set null',
    }),
    jarChangeMl: doublePrecision('jar_change_ml').notNull().default(0),
    addedAt: timestamp('added_at', { withTimezone: true }).notNull(),
    note: varchar('note', { length: 200 }).notNull().default(''),
    supersedesId: uuid('supersedes_id').references((): AnyPgColumn => dyeLogEntries.id, {
      onDelete: 'cascade',
    }),
    reason: varchar('reason', { length: 200 }).notNull().default(''),
    recordedBy: text('recorded_by').references(() => user.id, { onDelete: 'set null' }),
    recordedAt: timestamp('recorded_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    index('dye_log_entries_session_idx').on(t.sessionId, t.recordedAt),
    uniqueIndex('dye_log_entries_supersedes_idx').on(t.supersedesId),
    check('dye_log_amount_range', sql`${t.amount} >= 0`),
  ],
);

/** A viewer's question; `meTooCount` is kept beside the rows of `liveQuestionMeToos`. */
export const liveQuestions = pgTable(
  'live_questions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    sessionId: uuid('session_id')
      .notNull()
      .references(() => liveSessions.id, { onDelete: 'cascade' }),
    askedBy: text('asked_by')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    text: varchar('text', { length: 280 }).notNull(),
    meTooCount: integer('me_too_count').notNull().default(0),
    askedAt: timestamp('asked_at', { withTimezone: true }).notNull().defaultNow(),
    answer: varchar('answer', { length: 280 }).notNull().default(''),
    answeredAt: timestamp('answered_at', { withTimezone: true }),
    answeredBy: text('answered_by').references(() => user.id, { onDelete: 'set null' }),
    hiddenAt: timestamp('hidden_at', { withTimezone: true }),
    hiddenBy: text('hidden_by').references(() => user.id, { onDelete: 'set null' }),
  },
  (t) => [
    index('live_questions_session_idx').on(t.sessionId, t.askedAt),
    index('live_questions_asker_idx').on(t.sessionId, t.askedBy, t.askedAt),
  ],
);

/** "Me too": once per person per question (the primary key says so). */
export const liveQuestionMeToos = pgTable(
  'live_question_me_toos',
  {
    questionId: uuid('question_id')
      .notNull()
      .references(() => liveQuestions.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.questionId, t.userId] })],
);

/** People whose questions the staff paused for one session. */
export const liveSessionMutes = pgTable(
  'live_session_mutes',
  {
    sessionId: uuid('session_id')
      .notNull()
      .references(() => liveSessions.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    mutedBy: text('muted_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [primaryKey({ columns: [t.sessionId, t.userId] })],
);
