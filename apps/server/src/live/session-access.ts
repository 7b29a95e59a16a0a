import type { StudioStanding } from '@vatside/contracts/roles';
import type { RealtimeError } from '@vatside/contracts/realtime';
import type { Database } from '@vatside/db/client';
import { studioStanding } from '../auth/authorize.ts';
import { can, type StudioAction } from '../auth/policy.ts';
import { HttpError } from '../http/errors.ts';
import { liveSessionRow, type LiveSessionRow } from './sessions.ts';

export interface SessionAccess {
  row: LiveSessionRow & { studioSlug: string };
  standing: StudioStanding;
  userId: string | null;
}

const hiddenSession = () => new HttpError(404, 'NOT_FOUND', 'That live session was not found.');

/**
 * The session and the asker's standing in its studio. A rehearsal is private: to anyone but the
 * host it does not exist, so they get the same 404 as for a session that never was.
 */
export async function sessionAccess(
  db: Database,
  sessionId: string,
  userId: string | null | undefined,
): Promise<SessionAccess> {
  const row = await liveSessionRow(db, sessionId);
  const standing = await studioStanding(db, row.studioId, userId ?? undefined);
  if (row.mode === 'rehearsal' && standing !== 'host') throw hiddenSession();
  return { row, standing, userId: userId ?? null };
}

/** Checks the policy table: visitors who need a role get 401 (sign in might help), others 403. */
export function requireSessionRole(access: SessionAccess, action: StudioAction): void {
  if (can(access.standing, action)) return;
  if (!access.userId) throw new HttpError(401, 'UNAUTHENTICATED', 'Sign in to do this.');
  throw new HttpError(403, 'FORBIDDEN', 'Your role in this studio does not allow this.');
}

export function requireSignedIn(access: SessionAccess): string {
  if (!access.userId) throw new HttpError(401, 'UNAUTHENTICATED', 'Sign in to do this.');
  return access.userId;
}

const realtimeCodes: RealtimeError['error']['code'][] = [
  'VALIDATION_FAILED',
  'UNAUTHENTICATED',
  'FORBIDDEN',
  'NOT_FOUND',
  'CONFLICT',
  'RATE_LIMITED',
];

/** A service's refusal as a socket ack; anything else is a bug and goes to the generic handler. */
export function asRealtimeRefusal(error: unknown): RealtimeError {
  if (!(error instanceof HttpError)) throw error;
  const code = realtimeCodes.find((c) => c === error.code) ?? 'VALIDATION_FAILED';
  return { error: { code, message: error.message } };
}

/** Runs a socket handler's work, turning refusals into acks. */
export async function refusing<T>(work: () => Promise<T>): Promise<T | RealtimeError> {
  try {
    return await work();
  } catch (error) {
    return asRealtimeRefusal(error);
  }
}
