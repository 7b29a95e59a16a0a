import type { ErrorCode } from '@vatside/contracts/errors';

/** An error meant for the client: the error middleware turns it into the one error shape. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ErrorCode,
    message: string,
    readonly fields?: Record<string, string[]>,
    /** Sent with the error, e.g. Retry-After on a 429. */
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what: string) => new HttpError(404, 'NOT_FOUND', `${what} was not found.`);
