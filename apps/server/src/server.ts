import { createServer, type Server as HttpServer } from 'node:http';
import { connectDatabase } from '@vatside/db/client';
import { createApp } from './app.ts';
import { createAuth } from './auth/auth.ts';
import type { Config } from './config.ts';
import type { AppDeps } from './deps.ts';
import { startMailWorker, type MailWorker } from './jobs/mail-worker.ts';
import { createLogger } from './logger.ts';
import { createMailer } from './mail/mailer.ts';
import { createNotifier } from './realtime/notifier.ts';
import { attachRedisAdapter } from './realtime/redis-adapter.ts';
import { createRealtime, type RealtimeServer } from './realtime/socket-server.ts';
import { createObjectStore } from './storage/object-store.ts';

export interface RunningServer {
  deps: AppDeps;
  httpServer: HttpServer;
  io: RealtimeServer;
  /** The mail job, when this process runs it (MAIL_WORKER_ENABLED). */
  mailWorker: MailWorker | null;
  url: string;
  close(): Promise<void>;
}

/** Builds the whole server from real services and starts listening. */
export async function startServer(config: Config): Promise<RunningServer> {
  const logger = createLogger(config);
  const database = connectDatabase(config.DATABASE_URL);
  const mailer = createMailer(config);
  const objectStore = createObjectStore(config);
  const deps: AppDeps = {
    config,
    logger,
    database,
    objectStore,
    mailer,
    auth: createAuth(config, database.db, mailer, objectStore, logger),
    notifier: createNotifier(),
  };
  const httpServer = createServer(createApp(deps));
  const io = createRealtime(httpServer, deps);
  // Several processes share rooms through Redis; one process needs nothing.
  const redis = config.REDIS_URL ? await attachRedisAdapter(io, config.REDIS_URL, logger) : null;
  deps.notifier.attach(io);
  await new Promise<void>((resolve, reject) => {
    httpServer.once('error', reject);
    // A live's phones all reconnect at once after a blip: a deep accept queue keeps the kernel
    // from dropping their connections (Node's default is 511; the kernel caps it at somaxconn).
    httpServer.listen({ port: config.PORT, host: config.HOST, backlog: 8192 }, resolve);
  });
  const mailWorker = config.MAIL_WORKER_ENABLED
    ? startMailWorker(deps, {
        pollMs: config.MAIL_WORKER_POLL_MS,
        batchSize: config.MAIL_WORKER_BATCH,
        retryBaseMs: config.MAIL_RETRY_BASE_MS,
        maxAttempts: config.MAIL_MAX_ATTEMPTS,
      })
    : null;
  const address = httpServer.address();
  const port = typeof address === 'object' && address ? address.port : config.PORT;
  return {
    deps,
    httpServer,
    io,
    mailWorker,
    url: `http://${config.HOST}:${port}`,
    async close() {
      // The mail in hand is finished and recorded before the database goes away.
      await mailWorker?.stop();
      await io.close(); // also closes the HTTP server
      await redis?.close();
      deps.objectStore.close();
      deps.mailer.close();
      await deps.database.close();
    },
  };
}
