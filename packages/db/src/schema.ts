import {
  boolean,
  index,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uuid,
  varchar,
} from 'drizzle-orm/pg-core';
import { user } from './auth-schema.ts';

export * from './auth-schema.ts';
export * from './workbench-schema.ts';
export * from './dye-along-schema.ts';

/** A dyer's space: its dye shelf, its dye-alongs and its community. */
export const studios = pgTable('studios', {
  id: uuid('id').primaryKey().defaultRandom(),
  slug: varchar('slug', { length: 64 }).notNull().unique(),
  name: varchar('name', { length: 80 }).notNull(),
  tagline: varchar('tagline', { length: 160 }).notNull().default(''),
  accentHex: varchar('accent_hex', { length: 7 }).notNull(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});

export const studioRole = pgEnum('studio_role', ['host', 'moderator', 'viewer']);

/** One row per person per studio: a viewer follows it, a moderator helps, a host runs it. */
export const studioMembers = pgTable(
  'studio_members',
  {
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    userId: text('user_id')
      .notNull()
      .references(() => user.id, { onDelete: 'cascade' }),
    role: studioRole('role').notNull(),
    /** The person asked for the studio's e-mails (announcements, reminders). */
    mailOptIn: boolean('mail_opt_in').notNull().default(false),
    joinedAt: timestamp('joined_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [
    primaryKey({ columns: [t.studioId, t.userId] }),
    index('studio_members_user_idx').on(t.userId),
  ],
);

/** A host's invitation to help as a moderator; the token is stored hashed and works once. */
export const studioInvitations = pgTable(
  'studio_invitations',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    studioId: uuid('studio_id')
      .notNull()
      .references(() => studios.id, { onDelete: 'cascade' }),
    email: text('email').notNull(),
    role: studioRole('role').notNull().default('moderator'),
    tokenHash: text('token_hash').notNull().unique(),
    invitedBy: text('invited_by').references(() => user.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }).notNull(),
    acceptedAt: timestamp('accepted_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
  },
  (t) => [index('studio_invitations_studio_idx').on(t.studioId)],
);
export * from './live-schema.ts';
export * from './sharing-schema.ts';
export * from './live-log-schema.ts';
export * from './archive-schema.ts';
