import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import { studioStorageSchema } from '@vatside/contracts/storage';
import type { Submission } from '@vatside/contracts/submissions';
import type { RunningServer } from '../server.ts';
import { sharerBytes } from '../services/share-limits.ts';
import { TestClient } from '../test-support/client.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import {
  baseDetails,
  makeSharingMonth,
  share,
  shareForm,
  sharePath,
  skeinPhoto,
  storedSkeins,
  type SharingMonth,
} from '../test-support/sharing-fixtures.ts';
import { startTestServer } from '../test-support/test-server.ts';
import { notAnImage } from '../uploads/test-images.ts';

// The per-person share limits and the host's view of the studio's storage. Every count comes
// from the database, so a second server process with the same settings must agree.

describe('share limits and storage use', () => {
  const servers: RunningServer[] = [];
  let server: RunningServer;
  let cast: Cast;
  let month: SharingMonth;
  const viewerSkeins: Submission[] = [];

  async function start(overrides: Parameters<typeof startTestServer>[0]) {
    const started = await startTestServer(overrides);
    servers.push(started);
    return started;
  }

  /** The same person signed in on another server process. */
  async function signedInOn(other: RunningServer, person: keyof Cast['people']) {
    const client = new TestClient(other);
    const { email, password } = cast.people[person];
    const res = await client.request('POST', '/api/auth/sign-in/email', { email, password });
    if (res.status !== 200) throw new Error(`sign-in ${res.status}`);
    return client;
  }

  async function refused(client: TestClient, body: FormData, status: number) {
    const before = await storedSkeins(server, cast.studioId);
    const res = await client.request('POST', sharePath(cast, month.dyeAlong.id), body);
    expect(res.status).toBe(status);
    expect(await storedSkeins(server, cast.studioId)).toEqual(before);
    return { res, error: errorBodySchema.parse(await res.json()).error };
  }

  beforeAll(async () => {
    server = await start({ SHARES_PER_HOUR: '2' });
    cast = await castStudio(server, 'limits');
    month = await makeSharingMonth(cast.clients.host, cast.slug);
  });
  afterAll(() => Promise.all(servers.map((s) => s.close())));

  it('the third share within an hour → 429 with Retry-After, nothing stored, in any process', async () => {
    viewerSkeins.push(await share(cast.clients.viewer, cast, month.dyeAlong.id, { photos: 2 }));
    viewerSkeins.push(await share(cast.clients.viewer, cast, month.dyeAlong.id));
    const photo = await skeinPhoto('#2d6f86');
    const { res, error } = await refused(cast.clients.viewer, shareForm([photo], baseDetails), 429);
    expect(error.code).toBe('RATE_LIMITED');
    expect(error.message).toMatch(/shared 2 skeins in the last hour/);
    const retryAfterS = Number(res.headers.get('retry-after'));
    expect(retryAfterS).toBeGreaterThan(3_000);
    expect(retryAfterS).toBeLessThanOrEqual(3_600);

    // A second server process counts the same rows.
    const second = await start({ SHARES_PER_HOUR: '2' });
    const viaSecond = await refused(
      await signedInOn(second, 'viewer'),
      shareForm([photo], baseDetails),
      429,
    );
    expect(viaSecond.error.code).toBe('RATE_LIMITED');

    // The limit is per person: the moderator still shares.
    expect((await share(cast.clients.moderator, cast, month.dyeAlong.id)).status).toBe('waiting');
  });

  it('over the storage quota → 413 in plain words, nothing stored', async () => {
    await share(cast.clients.host, cast, month.dyeAlong.id);
    const used = await sharerBytes(server.deps.database.db, cast.studioId, cast.people.host.userId);
    expect(used).toBeGreaterThan(0);

    // Room for one more byte only: the photos are processed, found too big, and never stored.
    const nearlyFull = await start({ SHARE_STORAGE_QUOTA_BYTES: String(used + 1) });
    const afterProcessing = await refused(
      await signedInOn(nearlyFull, 'host'),
      shareForm([await skeinPhoto('#2d6f86')], baseDetails),
      413,
    );
    expect(afterProcessing.error.code).toBe('QUOTA_EXCEEDED');
    expect(afterProcessing.error.message).toMatch(/Withdraw an older skein/);

    // Full already: refused before the upload is read (a text file would otherwise be a 415).
    const full = await start({ SHARE_STORAGE_QUOTA_BYTES: String(used) });
    const beforeReading = await refused(
      await signedInOn(full, 'host'),
      shareForm([notAnImage], baseDetails),
      413,
    );
    expect(beforeReading.error.code).toBe('QUOTA_EXCEEDED');
  });

  it('the host sees the studio storage: sums match the stored objects, top sharer first', async () => {
    const res = await cast.clients.host.request('GET', `/api/studios/${cast.slug}/storage`);
    expect(res.status).toBe(200);
    const storage = studioStorageSchema.parse(await res.json());

    // Independent of the recorded sizes: download every web rendition and add up its bytes.
    const sizeOf = async (url: string) =>
      (await (await cast.clients.host.request('GET', url)).arrayBuffer()).byteLength;
    const inspirationBytes = await sizeOf(
      `/api/studios/${cast.slug}/images/${month.inspiration.id}/web`,
    );
    expect(storage.workbenchImages).toEqual({ bytes: inspirationBytes, images: 1 });

    const viewerPhotos = viewerSkeins.flatMap((s) => s.photos);
    const viewerBytes = (await Promise.all(viewerPhotos.map((p) => sizeOf(p.webUrl)))).reduce(
      (a, b) => a + b,
      0,
    );
    // Viewer 2 skeins (3 photos), moderator 1, host 1.
    expect(storage.skeinPhotos.skeins).toBe(4);
    expect(storage.skeinPhotos.photos).toBe(5);
    expect(storage.topSharers[0]).toMatchObject({
      userId: cast.people.viewer.userId,
      name: 'Vale Viewer',
      bytes: viewerBytes,
      skeins: 2,
      photos: 3,
    });
    expect(storage.topSharers.map((s) => s.bytes)).toEqual(
      [...storage.topSharers.map((s) => s.bytes)].sort((a, b) => b - a),
    );
    expect(storage.skeinPhotos.bytes).toBe(
      storage.topSharers.reduce((total, s) => total + s.bytes, 0),
    );
    expect(storage.totalBytes).toBe(storage.skeinPhotos.bytes + inspirationBytes);
    expect(storage.limits.sharesPerHour).toBe(2);
  });
});
