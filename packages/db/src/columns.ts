import { timestamp } from 'drizzle-orm/pg-core';

// Timestamps every table of ours carries; `updated_at` refreshes itself on each update.
export const createdAt = () =>
  timestamp('created_at', { withTimezone: true }).notNull().defaultNow();
export const updatedAt = () =>
  timestamp('updated_at', { withTimezone: true })
    .notNull()
    .defaultNow()
    .$onUpdate(() => new Date());
