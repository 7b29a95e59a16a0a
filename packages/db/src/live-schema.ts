import { sql } from 'drizzle-orm';
import {
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import { user } from './auth-schema.ts';
import { dyeAlongs } from './dye-along-schema.ts';
import { studios } from './schema.ts';

export const liveMode = pgEnum('live_mode', ['live', 'rehearsal']);

/**
 * A live session (or a private rehearsal) of a dye-along. `state` is the whole LiveState
 * (pots, steps, timers as absolute times, notes, delay); `revision` guards every write, so a
 * host action is applied once whichever server process receives it, and a restart resumes it.
 * `program` is the run sheets as they were at the start, so edits during the hour change nothing.
 */
export const liveSessions = pgTable(
  'live_sessions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    dyeAlongId: uuid('dye_along_id')
      .notNull()
      .references(() => dyeAlongs.id, { onDelete: 'cascade' }),
    mode: liveMode('mode').notNull(),
    revision: integer('revision').notNull().default(0),
    state: jsonb('state').notNull(),
    program: jsonb('program').notNull(),
    startedBy: text('started_by').references(() => user.id, { onDelete: 'set null' }),
    startedAt: timestamp('started_at', { withTimezone: true }).notNull().defaultNow(),
    endedAt: timestamp('ended_at', { withTimezone: true }),
  },
  (t) => [
    index('live_sessions_studio_idx').on(t.studioId, t.startedAt),
    // One running public session per dye-along at a time.
    uniqueIndex('live_sessions_one_running_idx')
      .on(t.dyeAlongId)
      .where(sql`${t.endedAt} is null and ${t.mode} = 'live'`),
  ],
);
