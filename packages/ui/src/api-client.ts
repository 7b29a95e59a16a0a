import { errorBodySchema } from '@vatside/contracts/errors';

/** Any schema with zod's `parse`, so callers pass the shared contracts directly. */
export type Parser<T> = { parse: (data: unknown) => T };

/**
 * What every failed API call throws. `code` is the server's error code, or one of ours:
 * NETWORK (no answer), BAD_RESPONSE (the answer did not match the contract).
 */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  constructor(
    readonly code: string,
    message: string,
    readonly status: number,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
  }
}

type GetOptions = {
  signal?: AbortSignal;
  /** Non-2xx statuses whose body is still the resource, e.g. 503 from a degraded health check. */
  acceptStatus?: number[];
};

export function apiGet<T>(path: string, schema: Parser<T>, options: GetOptions = {}) {
  return request(path, { method: 'GET', signal: options.signal }, schema, options.acceptStatus);
}

type SendMethod = 'POST' | 'PUT' | 'PATCH' | 'DELETE';

/** A change sent as JSON; `schema` parses the answer (omit it for 204 No Content). */
export function apiSend<T = undefined>(
  method: SendMethod,
  path: string,
  body?: unknown,
  schema?: Parser<T>,
): Promise<T> {
  const init: RequestInit = { method };
  if (body !== undefined) {
    init.body = JSON.stringify(body);
    init.headers = { 'Content-Type': 'application/json' };
  }
  return request(path, init, schema);
}

/**
 * How a request leaves: the browser's fetch, or, while the server writes a page's first HTML,
 * one that sends it to the API on the asker's behalf (their cookie, the server's own address).
 */
let transport: (path: string, init: RequestInit) => Promise<Response> = (path, init) =>
  fetch(path, init);

export function setApiTransport(next: typeof transport) {
  transport = next;
}

async function request<T>(
  path: string,
  init: RequestInit,
  schema?: Parser<T>,
  acceptStatus?: number[],
): Promise<T> {
  let response: Response;
  try {
    response = await transport(path, {
      ...init,
      credentials: 'include',
      headers: { Accept: 'application/json', ...init.headers },
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError('NETWORK', 'Vatside’s server did not answer. Check the connection.', 0);
  }

  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok && !acceptStatus?.includes(response.status)) {
    throw apiErrorFrom(response.status, body);
  }
  return parseAnswer(body, response.status, schema);
}

/** The ApiError for a failed answer: the server's own error shape, else a generic one. */
export function apiErrorFrom(status: number, body: unknown): ApiError {
  const parsed = errorBodySchema.safeParse(body);
  if (parsed.success) {
    const { code, message, fields } = parsed.data.error;
    return new ApiError(code, message, status, fields);
  }
  return new ApiError(`HTTP_${status}`, 'The server had a problem.', status);
}

/** A successful answer checked against its contract. */
export function parseAnswer<T>(body: unknown, status: number, schema?: Parser<T>): T {
  if (!schema) return undefined as T;
  try {
    return schema.parse(body);
  } catch {
    throw new ApiError('BAD_RESPONSE', 'The server sent something unexpected.', status);
  }
}
