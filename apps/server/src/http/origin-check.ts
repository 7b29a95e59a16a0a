import type { RequestHandler } from 'express';
import { HttpError } from './errors.ts';

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/**
 * Refuses state-changing API requests that a browser sent from another site. SameSite=Lax
 * cookies already keep the session out of such requests; this is the second lock. Requests
 * without an Origin header (mail clients' one-click unsubscribe, scripts) carry no cookie risk.
 */
export function sameOriginOnly(publicOrigin: string): RequestHandler {
  const allowed = new URL(publicOrigin).origin;
  return (req, _res, next) => {
    const origin = req.headers.origin;
    if (safeMethods.has(req.method) || !origin || origin === allowed) return next();
    next(new HttpError(403, 'FORBIDDEN', 'This request came from another site and was refused.'));
  };
}
