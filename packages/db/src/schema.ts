import { pgTable, text, timestamp, uuid, varchar } from 'drizzle-orm/pg-core';

/** A dyer's space: its dye shelf, its dye-alongs and its community. */
export const studios = pgTable('studios', {
  id: uuid('id').primaryKey().defaultRandom(),
  slug: varchar('slug', { length: 64 }).notNull().unique(),
  name: varchar('name', { length: 80 }).notNull(),
  tagline: varchar('tagline', { length: 160 }).notNull().default(''),
  accentHex: varchar('accent_hex', { length: 7 }).notNull(),
  createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
});
