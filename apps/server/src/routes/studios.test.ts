import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { studioDetailSchema } from '@vatside/contracts/studios';
import type { RunningServer } from '../server.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

describe('studios: create, public page, follow and unfollow', () => {
  let server: RunningServer;
  let cast: Cast;
  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'studios');
  });
  afterAll(() => server.close());

  const detail = async (who: keyof Cast['clients']) =>
    studioDetailSchema.parse(
      await (await cast.clients[who].request('GET', `/api/studios/${cast.slug}`)).json(),
    );

  it('shows each person where they stand, and visitors the public page', async () => {
    expect((await detail('host')).myRole).toBe('host');
    expect((await detail('moderator')).myRole).toBe('moderator');
    expect((await detail('viewer')).myRole).toBe('viewer');
    const seen = await detail('visitor');
    expect(seen).toMatchObject({ myRole: 'visitor', hostNames: ['Harbor Host'], followerCount: 1 });
  });

  it('refuses a taken address with 409 and a bad one with the field named', async () => {
    const taken = await cast.clients.otherHost.request('POST', '/api/studios', {
      name: 'Copycat',
      slug: cast.slug,
      accentHex: '#000000',
    });
    expect(taken.status).toBe(409);
    const bad = await cast.clients.otherHost.request('POST', '/api/studios', {
      name: 'Bad Slug',
      slug: 'Not A Slug',
      accentHex: 'teal',
    });
    expect(bad.status).toBe(400);
    const { error } = (await bad.json()) as { error: { fields: Record<string, string[]> } };
    expect(Object.keys(error.fields).sort()).toEqual(['accentHex', 'slug']);
  });

  it('lets a signed-in person follow with e-mail opt-in, change it, and unfollow', async () => {
    const follower = cast.clients.otherHost;
    const followed = studioDetailSchema.parse(
      await (
        await follower.request('PUT', `/api/studios/${cast.slug}/follow`, { mailOptIn: true })
      ).json(),
    );
    expect(followed).toMatchObject({ myRole: 'viewer', mailOptIn: true, followerCount: 2 });

    const quiet = studioDetailSchema.parse(
      await (
        await follower.request('PUT', `/api/studios/${cast.slug}/follow`, { mailOptIn: false })
      ).json(),
    );
    expect(quiet).toMatchObject({ myRole: 'viewer', mailOptIn: false, followerCount: 2 });

    const gone = studioDetailSchema.parse(
      await (await follower.request('DELETE', `/api/studios/${cast.slug}/follow`)).json(),
    );
    expect(gone).toMatchObject({ myRole: 'visitor', followerCount: 1 });
  });

  it('keeps a moderator a moderator when they follow, and refuses their unfollow', async () => {
    const mod = cast.clients.moderator;
    const followed = studioDetailSchema.parse(
      await (
        await mod.request('PUT', `/api/studios/${cast.slug}/follow`, { mailOptIn: true })
      ).json(),
    );
    expect(followed.myRole).toBe('moderator');
    expect((await mod.request('DELETE', `/api/studios/${cast.slug}/follow`)).status).toBe(409);
  });

  it('answers an unknown studio with 404', async () => {
    expect(
      (
        await cast.clients.visitor.request(
          'GET',
          `/api/studios/nowhere-${randomUUID().slice(0, 6)}`,
        )
      ).status,
    ).toBe(404);
  });
});
