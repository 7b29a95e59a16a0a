import { DyeKitError } from '@vatside/dye-kit';
import type { Page, PageQuery } from '@vatside/contracts/workbench-common';
import { HttpError } from '../http/errors.ts';

// Helpers shared by the workbench services: dye-kit's errors as 400s, timestamps, pages.

/** Runs dye-kit; its input errors become a 400 naming the field (prefixed with where it sits). */
export function withDyeKit<T>(fieldPrefix: string, run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (!(error instanceof DyeKitError)) throw error;
    const field = [fieldPrefix, error.field].filter(Boolean).join('.') || '(root)';
    throw new HttpError(400, 'VALIDATION_FAILED', error.message, { [field]: [error.message] });
  }
}

export const isoTimestamps = (row: { createdAt: Date; updatedAt: Date }) => ({
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

export const pageInfo = (query: PageQuery, total: number): Page => ({
  limit: query.limit,
  offset: query.offset,
  total,
});

/** A 400 for an id in the body that names nothing in this studio. */
export const unknownReference = (field: string, what: string) =>
  new HttpError(400, 'VALIDATION_FAILED', `That ${what} is not in this studio.`, {
    [field]: [`No such ${what} in this studio.`],
  });

/** PostgreSQL's SQLSTATE, wherever the driver or Drizzle put it. */
export function pgErrorCode(error: unknown): string | undefined {
  for (let e = error; e && typeof e === 'object'; e = (e as { cause?: unknown }).cause) {
    const code = (e as { code?: unknown }).code;
    if (typeof code === 'string' && /^[0-9A-Z]{5}$/.test(code)) return code;
  }
  return undefined;
}
