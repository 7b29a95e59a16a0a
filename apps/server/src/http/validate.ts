import type { z } from 'zod';
import { HttpError } from './errors.ts';

/** Parses input with a shared schema; failures become a 400 naming each bad field. */
export function parseInput<S extends z.ZodType>(
  schema: S,
  input: unknown,
  what: string,
): z.infer<S> {
  const result = schema.safeParse(input ?? {});
  if (result.success) return result.data;
  const fields: Record<string, string[]> = {};
  for (const issue of result.error.issues) {
    const key = issue.path.join('.') || '(root)';
    (fields[key] ??= []).push(issue.message);
  }
  throw new HttpError(
    400,
    'VALIDATION_FAILED',
    `The ${what} has missing or invalid fields.`,
    fields,
  );
}
