import { io as connect } from 'socket.io-client';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import { loadConfig } from '../config.ts';
import type { RunningServer } from '../server.ts';
import { TestClient, signUpVerified } from '../test-support/client.ts';
import { startTestServer } from '../test-support/test-server.ts';

// The security pass's checks that no other test makes (README, "Security"). The OWASP
// "Cross-Site Request Forgery Prevention" and "Error Handling" cheat sheets name these checks.

/** Whether a Socket.IO handshake with this Origin header is let in. */
async function handshake(url: string, origin?: string): Promise<'open' | 'refused'> {
  const socket = connect(url, {
    transports: ['websocket'],
    reconnection: false,
    extraHeaders: origin ? { origin } : {},
  });
  try {
    return await new Promise((resolve) => {
      socket.once('connect', () => resolve('open'));
      socket.once('connect_error', () => resolve('refused'));
    });
  } finally {
    socket.close();
  }
}

describe('requests from another site', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  it('refuses a live-socket handshake from a foreign page, lets the app and scripts in', async () => {
    const own = new URL(server.deps.config.PUBLIC_ORIGIN).origin;
    expect(await handshake(server.url, 'http://elsewhere.example')).toBe('refused');
    expect(await handshake(server.url, own)).toBe('open');
    expect(await handshake(server.url)).toBe('open');
  });

  it('refuses a sign-in posted from a foreign page', async () => {
    const person = await signUpVerified(server, 'csrf-sign-in');
    const res = await fetch(`${server.url}/api/auth/sign-in/email`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', origin: 'http://elsewhere.example' },
      body: JSON.stringify({ email: person.email, password: person.password }),
    });
    expect(res.status).toBe(403);
    expect(res.headers.getSetCookie().some((c) => c.includes('session_token'))).toBe(false);
  });
});

describe('cookies behind HTTPS', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startTestServer({ PUBLIC_ORIGIN: 'https://vatside.example' });
  });
  afterAll(() => server.close());

  it('marks the session cookie Secure, HttpOnly and SameSite=Lax', async () => {
    const person = await signUpVerified(server, 'secure-cookie');
    const res = await new TestClient(server).request('POST', '/api/auth/sign-in/email', {
      email: person.email,
      password: person.password,
    });
    const session = res.headers.getSetCookie().find((c) => c.includes('session_token'));
    expect(session).toMatch(/^__Secure-/);
    expect(session).toMatch(/;\s*Secure/i);
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=Lax/i);
  });
});

describe('a failure on our side', () => {
  let server: RunningServer;
  beforeAll(async () => {
    // A database that does not exist: every query fails with PostgreSQL's own words.
    const missing = new URL(process.env.DATABASE_URL ?? '');
    missing.pathname = '/vatside_test_no_such_database';
    server = await startTestServer({ DATABASE_URL: missing.toString() });
  });
  afterAll(() => server.close());

  it('answers with the plain error shape: no stack trace, no SQL, no database names', async () => {
    const res = await fetch(`${server.url}/api/studios/any-studio`);
    expect(res.status).toBe(500);
    const text = await res.text();
    const body = errorBodySchema.parse(JSON.parse(text));
    expect(body.error.code).toBe('INTERNAL');
    expect(text).not.toMatch(/\bat \S+ \(|\.ts:\d+|select |from "|postgres|no_such_database/i);
  });
});

describe('secrets come only from the environment', () => {
  const production = { NODE_ENV: 'production' } as NodeJS.ProcessEnv;

  it('refuses to start in production on the loopback defaults, naming each missing secret', () => {
    expect(() => loadConfig(production)).toThrow(
      /BETTER_AUTH_SECRET[\s\S]*DATABASE_URL[\s\S]*S3_ACCESS_KEY_ID[\s\S]*S3_SECRET_ACCESS_KEY[\s\S]*SMTP_URL/,
    );
  });

  it('starts in production once every secret is set', () => {
    const config = loadConfig({
      ...production,
      BETTER_AUTH_SECRET: 'a-deployment-secret-of-at-least-32-chars',
      DATABASE_URL: 'postgres://app:pw@db.internal:5432/vatside',
      S3_ACCESS_KEY_ID: 'key',
      S3_SECRET_ACCESS_KEY: 'secret',
      SMTP_URL: 'smtp://relay.internal:587',
    });
    expect(config.NODE_ENV).toBe('production');
  });
});
