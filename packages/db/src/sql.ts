// Query operators from the one drizzle-orm instance that built the schema, so every package
// composes queries with matching types (pnpm may install a second copy for better-auth's peers).
export {
  and,
  asc,
  count,
  countDistinct,
  desc,
  eq,
  gt,
  gte,
  inArray,
  isNotNull,
  isNull,
  lt,
  lte,
  max,
  min,
  ne,
  notInArray,
  or,
  sql,
  sum,
} from 'drizzle-orm';
export type { SQL } from 'drizzle-orm';
export { alias } from 'drizzle-orm/pg-core';
