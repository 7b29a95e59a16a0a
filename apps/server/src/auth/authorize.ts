import { and, eq } from '@vatside/db/sql';
import type { NextFunction, Request, Response } from 'express';
import { fromNodeHeaders } from 'better-auth/node';
import type { StudioStanding } from '@vatside/contracts/roles';
import type { Database } from '@vatside/db/client';
import { studioMembers, studios } from '@vatside/db/schema';
import { HttpError } from '../http/errors.ts';
import type { Auth } from './auth.ts';
import { can, type StudioAction } from './policy.ts';

export type SessionUser = Auth['$Infer']['Session']['user'];

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express's own extension point
  namespace Express {
    interface Request {
      /** The signed-in person, or null for a visitor; set by `attachSession`. */
      user?: SessionUser | null;
    }
  }
}

/** Reads the better-auth session cookie once per API request. */
export function attachSession(auth: Auth) {
  return async (req: Request, _res: Response, next: NextFunction) => {
    const found = await auth.api.getSession({ headers: fromNodeHeaders(req.headers) });
    req.user = found?.user ?? null;
    next();
  };
}

export function requireUser(req: Request): SessionUser {
  if (!req.user) throw new HttpError(401, 'UNAUTHENTICATED', 'Sign in to do this.');
  return req.user;
}

export interface StudioAccess {
  studio: typeof studios.$inferSelect;
  standing: StudioStanding;
  user: SessionUser | null;
}

export async function studioStanding(db: Database, studioId: string, userId: string | undefined) {
  if (!userId) return 'visitor' as const;
  const [member] = await db
    .select({ role: studioMembers.role })
    .from(studioMembers)
    .where(and(eq(studioMembers.studioId, studioId), eq(studioMembers.userId, userId)));
  return member?.role ?? 'visitor';
}

/**
 * Finds the studio and checks the asker's standing against the policy table.
 * Visitors who need a role get 401 (sign in might help); members without it get 403.
 */
export async function authorizeStudio(
  db: Database,
  req: Request,
  slug: string,
  action: StudioAction,
): Promise<StudioAccess> {
  const [studio] = await db.select().from(studios).where(eq(studios.slug, slug));
  if (!studio) throw new HttpError(404, 'NOT_FOUND', 'That studio was not found.');
  const user = req.user ?? null;
  const standing = await studioStanding(db, studio.id, user?.id);
  if (!can(standing, action)) {
    if (!user) throw new HttpError(401, 'UNAUTHENTICATED', 'Sign in to do this.');
    throw new HttpError(403, 'FORBIDDEN', 'Your role in this studio does not allow this.');
  }
  return { studio, standing, user };
}
