import express, { type Express } from 'express';
import helmet from 'helmet';
import { pinoHttp } from 'pino-http';
import { toNodeHandler } from 'better-auth/node';
import { attachSession } from './auth/authorize.ts';
import type { AppDeps } from './deps.ts';
import { apiNotFound, errorMiddleware } from './http/error-middleware.ts';
import { sameOriginOnly } from './http/origin-check.ts';
import { accountRouter } from './routes/account.ts';
import { archiveRouter } from './routes/archive.ts';
import { dyeAlongsRouter } from './routes/dye-alongs.ts';
import { galleryRouter } from './routes/gallery.ts';
import { dyeLogRouter } from './routes/dye-log.ts';
import { healthRouter } from './routes/health.ts';
import { liveRouter } from './routes/live.ts';
import { mailUnsubscribeRouter } from './routes/mail-unsubscribe.ts';
import { membersRouter } from './routes/members.ts';
import { reviewMailUnsubscribeRouter } from './routes/review-mail-unsubscribe.ts';
import { reviewRouter } from './routes/review.ts';
import { questionsRouter } from './routes/questions.ts';
import { storageRouter } from './routes/storage.ts';
import { studiosRouter } from './routes/studios.ts';
import { submissionsRouter } from './routes/submissions.ts';
import { workbenchBasesRouter } from './routes/workbench-bases.ts';
import { workbenchColorwaysRouter } from './routes/workbench-colorways.ts';
import { workbenchImagesRouter } from './routes/workbench-images.ts';
import { workbenchShelfRouter } from './routes/workbench-shelf.ts';
import { serveApps } from './static-apps.ts';

/** Every API router, in one list so the access-matrix test can enumerate the real routes. */
export const apiRouters = [
  healthRouter,
  accountRouter,
  studiosRouter,
  membersRouter,
  workbenchShelfRouter,
  workbenchBasesRouter,
  workbenchColorwaysRouter,
  workbenchImagesRouter,
  dyeAlongsRouter,
  mailUnsubscribeRouter,
  liveRouter,
  dyeLogRouter,
  questionsRouter,
  submissionsRouter,
  reviewRouter,
  galleryRouter,
  reviewMailUnsubscribeRouter,
  storageRouter,
  archiveRouter,
];

/** better-auth answers everything under this path itself (sign-up, sign-in, verify, reset, delete). */
export const authBasePath = '/api/auth';

export function createApp(deps: AppDeps): Express {
  const { config, logger } = deps;
  const secure = config.PUBLIC_ORIGIN.startsWith('https:');
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(pinoHttp({ logger, autoLogging: { ignore: (req) => !req.url?.startsWith('/api') } }));
  app.use(
    helmet({
      hsts: secure,
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:', new URL(config.S3_ENDPOINT).origin],
          'connect-src': ["'self'"],
          'font-src': ["'self'"],
          // Swatches set their color through the style attribute.
          'style-src': ["'self'", "'unsafe-inline'"],
          'upgrade-insecure-requests': secure ? [] : null,
        },
      },
    }),
  );
  // better-auth reads its own request bodies, so it goes before the JSON parser. Its own origin
  // check skips requests without a cookie, so a foreign page could sign a visitor in to the
  // attacker's account (login CSRF): the same-origin lock covers these routes too.
  app.all(
    `${authBasePath}/{*rest}`,
    sameOriginOnly(config.PUBLIC_ORIGIN),
    toNodeHandler(deps.auth),
  );
  app.use(
    '/api',
    sameOriginOnly(config.PUBLIC_ORIGIN),
    express.json({ limit: `${config.JSON_BODY_LIMIT_KB}kb` }),
    attachSession(deps.auth),
  );
  for (const router of apiRouters) app.use('/api', router(deps));
  app.use('/api', apiNotFound);
  if (config.APPS_DIR) serveApps(app, config.APPS_DIR, logger);
  app.use(errorMiddleware);
  return app;
}
