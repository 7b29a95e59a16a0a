import type { Auth } from './auth/auth.ts';
import type { DatabaseHandle } from '@vatside/db/client';
import type { Config } from './config.ts';
import type { Logger } from './logger.ts';
import type { Mailer } from './mail/mailer.ts';
import type { Notifier } from './realtime/notifier.ts';
import type { ObjectStore } from './storage/object-store.ts';

/** What the routes and services are built from; tests build it from the real services too. */
export interface AppDeps {
  config: Config;
  logger: Logger;
  database: DatabaseHandle;
  objectStore: ObjectStore;
  mailer: Mailer;
  auth: Auth;
  notifier: Notifier;
}
