import { betterAuth } from 'better-auth';
import { drizzleAdapter } from 'better-auth/adapters/drizzle';
import { APIError } from 'better-auth/api';
import { account, session, user, verification } from '@vatside/db/schema';
import type { Database } from '@vatside/db/client';
import type { Config } from '../config.ts';
import type { Logger } from '../logger.ts';
import { passwordResetMail, verificationMail } from '../mail/auth-mails.ts';
import type { Mailer } from '../mail/mailer.ts';
import { sharedPhotoKeysOf } from '../services/account.ts';
import { soleHostedStudios } from '../services/memberships.ts';
import type { ObjectStore } from '../storage/object-store.ts';

export const unitSystems = ['us', 'metric'] as const;

export function createAuth(
  config: Config,
  db: Database,
  mailer: Mailer,
  objectStore: ObjectStore,
  logger: Logger,
) {
  const attempts = { window: 60, max: config.AUTH_ATTEMPTS_PER_MINUTE };
  // The rows of a leaving person's skeins go with the account (cascade); their photos' objects
  // are listed before and removed after, so nothing of theirs stays in the store.
  const photosOfLeaving = new Map<string, string[]>();
  return betterAuth({
    appName: 'Vatside',
    baseURL: config.PUBLIC_ORIGIN,
    basePath: '/api/auth',
    secret: config.BETTER_AUTH_SECRET,
    trustedOrigins: [config.PUBLIC_ORIGIN],
    telemetry: { enabled: false },
    database: drizzleAdapter(db, {
      provider: 'pg',
      schema: { user, session, account, verification },
    }),
    emailAndPassword: {
      enabled: true,
      requireEmailVerification: true,
      minPasswordLength: 10,
      resetPasswordTokenExpiresIn: 60 * 60,
      revokeSessionsOnPasswordReset: true,
      sendResetPassword: async ({ user: u, url }) => {
        await mailer.send(passwordResetMail(u.email, u.name, url));
      },
    },
    emailVerification: {
      sendOnSignUp: true,
      autoSignInAfterVerification: true,
      sendVerificationEmail: async ({ user: u, url }) => {
        await mailer.send(verificationMail(u.email, u.name, url));
      },
    },
    user: {
      additionalFields: {
        timeZone: { type: 'string', required: false, defaultValue: 'UTC' },
        unitSystem: { type: 'string', required: false, defaultValue: 'us' },
        defaultSkeinWeightG: { type: 'number', required: false, defaultValue: 100 },
      },
      deleteUser: {
        enabled: true,
        // A studio always keeps a host: hand it over before leaving.
        beforeDelete: async (u) => {
          const studios = await soleHostedStudios(db, u.id);
          if (studios.length > 0) {
            throw new APIError('BAD_REQUEST', {
              message: `You are the only host of ${studios.join(', ')}. Make someone else a host first.`,
            });
          }
          photosOfLeaving.set(u.id, await sharedPhotoKeysOf(db, u.id));
        },
        afterDelete: async (u) => {
          const keys = photosOfLeaving.get(u.id) ?? [];
          photosOfLeaving.delete(u.id);
          for (const key of keys) {
            await objectStore
              .delete(key)
              .catch((err: unknown) => logger.error({ err, key }, 'photo of a deleted account'));
          }
        },
      },
    },
    session: { expiresIn: 60 * 60 * 24 * 14, updateAge: 60 * 60 * 24 },
    rateLimit: {
      enabled: true,
      window: 60,
      max: 300,
      customRules: {
        '/sign-in/email': attempts,
        '/sign-up/email': attempts,
        '/request-password-reset': attempts,
        '/reset-password': attempts,
        '/send-verification-email': attempts,
      },
    },
    advanced: {
      useSecureCookies: config.PUBLIC_ORIGIN.startsWith('https:'),
      defaultCookieAttributes: { httpOnly: true, sameSite: 'lax' },
    },
  });
}

export type Auth = ReturnType<typeof createAuth>;
