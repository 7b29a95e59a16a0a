import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { friendlyIssue } from './friendly-issue.ts';

/** zodResolver with our plain-language messages. */
export function formResolver<S extends z.ZodType<unknown, Record<string, unknown>>>(schema: S) {
  return zodResolver(schema, { error: friendlyIssue });
}
