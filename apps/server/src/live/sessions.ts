import { randomUUID } from 'node:crypto';
import {
  applyHostAction,
  LiveActionError,
  liveStateSchema,
  type HostAction,
  type LiveState,
} from '@vatside/contracts/live';
import { liveProgramSchema, type LiveProgram } from '@vatside/contracts/live-program';
import type { Database } from '@vatside/db/client';
import { dyeAlongs, liveSessions, studios } from '@vatside/db/schema';
import { and, desc, eq, isNull } from '@vatside/db/sql';
import { HttpError } from '../http/errors.ts';
import { transitionDyeAlong } from '../services/dye-alongs.ts';
import { buildProgramPots, initialState } from './program.ts';

export type LiveSessionRow = typeof liveSessions.$inferSelect;

const conflict = (message: string) => new HttpError(409, 'CONFLICT', message);

/**
 * Opens a live session (the dye-along goes live) or a private rehearsal (nothing changes in
 * the month; the rehearsal is deleted when it ends).
 */
export async function startLiveSession(
  db: Database,
  studio: { id: string; slug: string; name: string },
  dyeAlongId: string,
  mode: LiveProgram['mode'],
  hostId: string,
): Promise<{ sessionId: string }> {
  const [dyeAlong] = await db
    .select()
    .from(dyeAlongs)
    .where(and(eq(dyeAlongs.id, dyeAlongId), eq(dyeAlongs.studioId, studio.id)));
  if (!dyeAlong) throw new HttpError(404, 'NOT_FOUND', 'That dye-along was not found.');
  if (mode === 'live' && !['announced', 'live'].includes(dyeAlong.status)) {
    throw conflict(
      `A ${dyeAlong.status} dye-along cannot go live; announce it first, or rehearse privately.`,
    );
  }
  if (dyeAlong.status === 'archived') throw conflict('This dye-along is archived.');
  const pots = await buildProgramPots(db, dyeAlongId);
  if (pots.length === 0 || pots.every((p) => p.steps.length === 0)) {
    throw conflict(
      'Give the month’s colorways run sheets before starting: there is nothing to follow yet.',
    );
  }
  if (mode === 'live' && dyeAlong.status === 'announced') {
    await transitionDyeAlong(db, studio.id, dyeAlongId, 'live');
  }
  const sessionId = randomUUID();
  const program: LiveProgram = {
    sessionId,
    mode,
    dyeAlong: {
      id: dyeAlong.id,
      title: dyeAlong.title,
      studioSlug: studio.slug,
      studioName: studio.name,
      streamUrl: dyeAlong.streamUrl,
    },
    pots,
  };
  const inserted = await db
    .insert(liveSessions)
    .values({
      id: sessionId,
      studioId: studio.id,
      dyeAlongId,
      mode,
      state: initialState(sessionId, mode, pots),
      program,
      startedBy: hostId,
    })
    .onConflictDoNothing()
    .returning({ id: liveSessions.id });
  if (inserted.length === 0) throw conflict('A live session of this dye-along is already running.');
  return { sessionId };
}

export async function liveSessionRow(
  db: Database,
  sessionId: string,
): Promise<LiveSessionRow & { studioSlug: string }> {
  const [row] = await db
    .select({ session: liveSessions, studioSlug: studios.slug })
    .from(liveSessions)
    .innerJoin(studios, eq(studios.id, liveSessions.studioId))
    .where(eq(liveSessions.id, sessionId));
  if (!row) throw new HttpError(404, 'NOT_FOUND', 'That live session was not found.');
  return { ...row.session, studioSlug: row.studioSlug };
}

export const sessionState = (row: LiveSessionRow): LiveState => liveStateSchema.parse(row.state);
export const sessionProgram = (row: LiveSessionRow): LiveProgram =>
  liveProgramSchema.parse(row.program);

export async function runningLiveSession(db: Database, studioId: string) {
  const [row] = await db
    .select({
      sessionId: liveSessions.id,
      dyeAlongId: liveSessions.dyeAlongId,
      title: dyeAlongs.title,
      startedAt: liveSessions.startedAt,
    })
    .from(liveSessions)
    .innerJoin(dyeAlongs, eq(dyeAlongs.id, liveSessions.dyeAlongId))
    .where(
      and(
        eq(liveSessions.studioId, studioId),
        eq(liveSessions.mode, 'live'),
        isNull(liveSessions.endedAt),
      ),
    )
    .orderBy(desc(liveSessions.startedAt))
    .limit(1);
  return row ? { ...row, startedAt: row.startedAt.toISOString() } : null;
}

/**
 * Applies a host action with optimistic concurrency: the write only lands on the revision it
 * was computed from, so two processes (or two taps) never apply one action twice or lose one.
 * With `baseRevision` (what the host's screen showed), an action meant for an older state is
 * refused instead of applied on top of the newer one.
 */
export async function applyLiveAction(
  db: Database,
  sessionId: string,
  action: HostAction,
  nowMs = Date.now(),
  baseRevision?: number,
  /** The row the caller just read, saving the first attempt a round trip. */
  freshRow?: LiveSessionRow,
): Promise<LiveState> {
  for (let attempt = 0; attempt < 5; attempt++) {
    const row = attempt === 0 && freshRow ? freshRow : await liveSessionRow(db, sessionId);
    if (baseRevision !== undefined && row.revision !== baseRevision) {
      throw conflict(
        'The session moved on since your screen last updated; check it and try again.',
      );
    }
    let next: LiveState;
    try {
      next = applyHostAction(sessionState(row), action, nowMs, () => randomUUID());
    } catch (error) {
      if (error instanceof LiveActionError) throw conflict(error.message);
      throw error;
    }
    const ended = next.status === 'ended';
    if (ended && row.mode === 'rehearsal') {
      // A rehearsal leaves no trace in the month.
      const gone = await db
        .delete(liveSessions)
        .where(and(eq(liveSessions.id, sessionId), eq(liveSessions.revision, row.revision)))
        .returning({ id: liveSessions.id });
      if (gone.length === 1) return next;
      continue;
    }
    const written = await db
      .update(liveSessions)
      .set({ state: next, revision: next.revision, ...(ended ? { endedAt: new Date(nowMs) } : {}) })
      .where(and(eq(liveSessions.id, sessionId), eq(liveSessions.revision, row.revision)))
      .returning({ id: liveSessions.id });
    if (written.length === 1) return next;
  }
  throw conflict('The session changed while this was sent; try again.');
}
