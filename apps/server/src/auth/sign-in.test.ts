import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { meSchema } from '@vatside/contracts/account';
import type { RunningServer } from '../server.ts';
import { TestClient, firstLink, signUpVerified } from '../test-support/client.ts';
import { uniqueRecipient, waitForMail } from '../test-support/mail-catcher.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('sign-up, verification, sign-in, sign-out (better-auth, real mail)', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  it('refuses to sign in before the address is confirmed, then works after the mailed link', async () => {
    const client = new TestClient(server);
    const email = uniqueRecipient('verify');
    const password = 'a-long-enough-password';
    const signUp = await client.request('POST', '/api/auth/sign-up/email', {
      email,
      password,
      name: 'Marin Doe',
      timeZone: 'America/Halifax',
    });
    expect(signUp.status).toBe(200);

    const early = await client.request('POST', '/api/auth/sign-in/email', { email, password });
    expect(early.status).toBe(403);
    expect(client.signedIn).toBe(false);

    const mail = await waitForMail(email);
    expect(mail.subject).toMatch(/confirm/i);
    const verified = await client.visit(firstLink(mail.text));
    expect(verified.status).toBe(302);

    const me = meSchema.parse(await (await client.request('GET', '/api/me')).json());
    expect(me.profile).toMatchObject({
      email,
      name: 'Marin Doe',
      emailVerified: true,
      timeZone: 'America/Halifax',
    });

    await client.request('POST', '/api/auth/sign-out', {});
    expect(await (await client.request('GET', '/api/me')).json()).toBeNull();

    const again = await client.request('POST', '/api/auth/sign-in/email', { email, password });
    expect(again.status).toBe(200);
    expect((await client.request('GET', '/api/me')).status).toBe(200);
  });

  it('sets the session cookie httpOnly and SameSite', async () => {
    const person = await signUpVerified(server, 'cookie');
    const res = await new TestClient(server).request('POST', '/api/auth/sign-in/email', {
      email: person.email,
      password: person.password,
    });
    const session = res.headers.getSetCookie().find((c) => c.includes('session_token'));
    expect(session).toMatch(/HttpOnly/i);
    expect(session).toMatch(/SameSite=Lax/i);
  });

  it('rejects a wrong password without saying whether the address exists', async () => {
    const person = await signUpVerified(server, 'wrongpw');
    const res = await new TestClient(server).request('POST', '/api/auth/sign-in/email', {
      email: person.email,
      password: 'not-the-password',
    });
    expect(res.status).toBe(401);
  });
});

describe('password reset through the mailed link', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  it('sets a new password that then signs in; the old one no longer does', async () => {
    const person = await signUpVerified(server, 'reset');
    const visitor = new TestClient(server);
    const asked = await visitor.request('POST', '/api/auth/request-password-reset', {
      email: person.email,
      redirectTo: '/reset-password',
    });
    expect(asked.status).toBe(200);

    const mail = await waitForMail(person.email, /reset/i);
    const landing = await visitor.visit(firstLink(mail.text));
    expect(landing.status).toBe(302);
    const token = new URL(landing.headers.get('location') ?? '', server.url).searchParams.get(
      'token',
    );
    expect(token).toBeTruthy();

    const reset = await visitor.request('POST', '/api/auth/reset-password', {
      token,
      newPassword: 'brand-new-password-42',
    });
    expect(reset.status).toBe(200);

    const oldTry = await new TestClient(server).request('POST', '/api/auth/sign-in/email', {
      email: person.email,
      password: person.password,
    });
    expect(oldTry.status).toBe(401);
    const newTry = await new TestClient(server).request('POST', '/api/auth/sign-in/email', {
      email: person.email,
      password: 'brand-new-password-42',
    });
    expect(newTry.status).toBe(200);
  });
});
