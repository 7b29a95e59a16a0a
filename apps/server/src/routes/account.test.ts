import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { meSchema, profileSchema } from '@vatside/contracts/account';
import { eq } from '@vatside/db/sql';
import { studioMembers, user } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { TestClient, signUpVerified } from '../test-support/client.ts';
import { castStudio } from '../test-support/personas.ts';
import { makeSharingMonth, share, storedSkeins } from '../test-support/sharing-fixtures.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('profile and account deletion', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startTestServer();
  });
  afterAll(() => server.close());

  it('updates display name, time zone, units and default skein weight', async () => {
    const person = await signUpVerified(server, 'profile');
    const res = await person.client.request('PATCH', '/api/me/profile', {
      name: 'Rowan Saltby',
      timeZone: 'Pacific/Auckland',
      unitSystem: 'metric',
      defaultSkeinWeightG: 115,
    });
    expect(res.status).toBe(200);
    expect(profileSchema.parse(await res.json())).toMatchObject({
      name: 'Rowan Saltby',
      timeZone: 'Pacific/Auckland',
      unitSystem: 'metric',
      defaultSkeinWeightG: 115,
    });
  });

  it('refuses an unknown time zone, a silly skein weight and unknown fields, changing nothing', async () => {
    const person = await signUpVerified(server, 'badprofile');
    for (const body of [
      { timeZone: 'Mars/Olympus' },
      { defaultSkeinWeightG: 0 },
      { role: 'host' },
      {},
    ]) {
      expect((await person.client.request('PATCH', '/api/me/profile', body)).status).toBe(400);
    }
    const me = meSchema.parse(await (await person.client.request('GET', '/api/me')).json());
    expect(me.profile).toMatchObject({ timeZone: 'UTC', defaultSkeinWeightG: 100 });
  });

  it('deletes a viewer: memberships and sessions go, the address no longer signs in', async () => {
    const cast = await castStudio(server, 'delete');
    const viewer = cast.people.viewer;
    const res = await viewer.client.request('POST', '/api/auth/delete-user', {
      password: viewer.password,
    });
    expect(res.status).toBe(200);
    const db = server.deps.database.db;
    expect(await db.select().from(user).where(eq(user.id, viewer.userId))).toHaveLength(0);
    expect(
      await db.select().from(studioMembers).where(eq(studioMembers.userId, viewer.userId)),
    ).toHaveLength(0);
    const again = await new TestClient(server).request('POST', '/api/auth/sign-in/email', {
      email: viewer.email,
      password: viewer.password,
    });
    expect(again.status).toBe(401);
  });

  it('deleting a sharer removes their skeins’ photos from the object store', async () => {
    const cast = await castStudio(server, 'delete-sharer');
    const { dyeAlong } = await makeSharingMonth(cast.people.host.client, cast.slug);
    const viewer = cast.people.viewer;
    await share(viewer.client, cast, dyeAlong.id, { photos: 2 });
    // Two photos, each a web rendition and a thumbnail.
    expect(await storedSkeins(server, cast.studioId)).toEqual({ objects: 4, rows: 1 });
    const res = await viewer.client.request('POST', '/api/auth/delete-user', {
      password: viewer.password,
    });
    expect(res.status).toBe(200);
    expect(await storedSkeins(server, cast.studioId)).toEqual({ objects: 0, rows: 0 });
  });

  it('refuses to delete the only host of a studio, keeping everything', async () => {
    const cast = await castStudio(server, 'keephost');
    const host = cast.people.host;
    const res = await host.client.request('POST', '/api/auth/delete-user', {
      password: host.password,
    });
    expect(res.status).toBe(400);
    expect(((await res.json()) as { message: string }).message).toMatch(/only host/);
    expect(
      await server.deps.database.db.select().from(user).where(eq(user.id, host.userId)),
    ).toHaveLength(1);
  });
});

describe('rate limits on sign-in', () => {
  let server: RunningServer;
  beforeAll(async () => {
    server = await startTestServer({ AUTH_ATTEMPTS_PER_MINUTE: '3' });
  });
  afterAll(() => server.close());

  it('answers 429 after too many attempts from one address', async () => {
    const client = new TestClient(server);
    const statuses: number[] = [];
    for (let i = 0; i < 5; i++) {
      const res = await client.request('POST', '/api/auth/sign-in/email', {
        email: 'nobody@example.test',
        password: 'wrong-password-1',
      });
      statuses.push(res.status);
    }
    // The limiter lets at most the configured number through, then refuses every further try.
    expect(statuses[0]).toBe(401);
    expect(statuses.filter((s) => s === 401).length).toBeLessThanOrEqual(3);
    expect(statuses.slice(3)).toEqual([429, 429]);
  });
});
