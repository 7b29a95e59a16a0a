import { inferAdditionalFields } from 'better-auth/client/plugins';
import { createAuthClient } from 'better-auth/react';
import { ApiError } from './api-client.ts';

/** Both apps talk to the same better-auth server on their own origin. */
export const authClient = createAuthClient({
  basePath: '/api/auth',
  plugins: [
    inferAdditionalFields({
      user: { timeZone: { type: 'string', required: false } },
    }),
  ],
});

type AuthFailure = { status: number; code?: string | undefined; message?: string | undefined };

/** better-auth answers `{ data, error }`; this throws an ApiError like the rest of our API. */
export async function authCall<T>(
  call: Promise<{ data: T | null; error: AuthFailure | null }>,
): Promise<T> {
  let result: { data: T | null; error: AuthFailure | null };
  try {
    result = await call;
  } catch {
    throw new ApiError('NETWORK', 'Vatside’s server did not answer. Check the connection.', 0);
  }
  const { data, error } = result;
  if (error) {
    if (error.status === 429) {
      throw new ApiError('RATE_LIMITED', 'Too many tries; wait a minute.', 429);
    }
    throw new ApiError(
      error.code ?? `HTTP_${error.status}`,
      error.message ?? 'The sign-in service had a problem.',
      error.status,
    );
  }
  return data as T;
}
