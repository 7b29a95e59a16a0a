import exifr from 'exifr';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import type { Submission, SubmissionList } from '@vatside/contracts/submissions';
import { deltaE2000, hexToLab } from '@vatside/dye-kit';
import { eq } from '@vatside/db/sql';
import { submissions } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { inDays } from '../test-support/dye-along-fixtures.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import {
  RIGHT_HALF,
  YARN_ON_LEFT,
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
import { countObjects } from '../uploads/test-bucket.ts';
import { HIDDEN_SCRIPT, jpegWithGps, notAnImage } from '../uploads/test-images.ts';

describe('sharing a skein and "my skeins"', () => {
  let server: RunningServer;
  let cast: Cast;
  let month: SharingMonth;
  const mine = (rest = '') => `/api/studios/${cast.slug}/my-submissions${rest}`;

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'share');
    month = await makeSharingMonth(cast.clients.host, cast.slug);
  });
  afterAll(() => server.close());

  async function expectRefusal(body: FormData, status: number, code: string, message: RegExp) {
    const before = await storedSkeins(server, cast.studioId);
    const res = await cast.clients.viewer.request('POST', sharePath(cast, month.dyeAlong.id), body);
    expect(res.status).toBe(status);
    const error = errorBodySchema.parse(await res.json()).error;
    expect(error.code).toBe(code);
    expect(error.message).toMatch(message);
    expect(await storedSkeins(server, cast.studioId)).toEqual(before);
    return error;
  }

  describe('the sharing window', () => {
    it('is refused plainly before it opens and after it closes, storing nothing', async () => {
      const later = await makeSharingMonth(cast.clients.host, cast.slug, {
        shareOpensAt: inDays(5).toISOString(),
      });
      const closed = await makeSharingMonth(cast.clients.host, cast.slug, {
        shareOpensAt: inDays(-3).toISOString(),
        shareClosesAt: inDays(-1).toISOString(),
      });
      const photo = await skeinPhoto('#2d6f86');
      for (const [m, words] of [
        [later, /Sharing opens on/],
        [closed, /Sharing closed on/],
      ] as const) {
        const before = await storedSkeins(server, cast.studioId);
        const res = await cast.clients.viewer.request(
          'POST',
          sharePath(cast, m.dyeAlong.id),
          shareForm([photo], baseDetails),
        );
        expect(res.status).toBe(409);
        expect(errorBodySchema.parse(await res.json()).error.message).toMatch(words);
        expect(await storedSkeins(server, cast.studioId)).toEqual(before);
      }
    });

    it('is open once shareOpensAt has passed', async () => {
      const skein = await share(cast.clients.viewer, cast, month.dyeAlong.id);
      expect(skein.status).toBe('waiting');
    });
  });

  describe('photos through the pipeline', () => {
    it('one photo: stored as two renditions, no metadata, the details kept, consent off', async () => {
      const before = await storedSkeins(server, cast.studioId);
      const res = await cast.clients.viewer.request(
        'POST',
        sharePath(cast, month.dyeAlong.id),
        shareForm([await jpegWithGps(120, 60)], {
          ...baseDetails,
          colorwayId: month.colorwayId,
        }),
      );
      expect(res.status).toBe(201);
      const skein = (await res.json()) as Submission;
      expect(skein).toMatchObject({
        status: 'waiting',
        consentToFeature: false,
        reason: null,
        baseName: 'Shoreline Sock',
        dyesUsed: ['Brinewell Blue', 'Table vinegar'],
        colorway: { id: month.colorwayId, name: 'Pool Teal' },
      });
      expect(skein.photos).toHaveLength(1);
      expect(skein.photos[0]!.yarnCrop).toEqual({ x: 0, y: 0, width: 1, height: 1 });
      expect(await storedSkeins(server, cast.studioId)).toEqual({
        objects: before.objects + 2,
        rows: before.rows + 1,
      });
      const web = await cast.clients.viewer.request('GET', skein.photos[0]!.webUrl);
      expect(web.status).toBe(200);
      const bytes = Buffer.from(await web.arrayBuffer());
      expect(await exifr.parse(bytes, true)).toBeUndefined();
      const meta = await sharp(bytes).metadata();
      expect([meta.exif, meta.icc, meta.orientation]).toEqual([undefined, undefined, undefined]);
      // Orientation 6 applied: 120 × 60 stands up as 60 × 120.
      expect([skein.photos[0]!.width, skein.photos[0]!.height]).toEqual([60, 120]);
    });

    it('four photos in one request, each with its yarn area', async () => {
      const skein = await share(cast.clients.viewer, cast, month.dyeAlong.id, { photos: 4 });
      expect(skein.photos.map((p) => p.position)).toEqual([1, 2, 3, 4]);
      expect(skein.photos.every((p) => p.yarnCrop.width === 0.5)).toBe(true);
      expect(
        await countObjects(server.deps.config, `studios/${cast.studioId}/skeins/`),
      ).toBeGreaterThanOrEqual(8);
    });

    it('five photos → 400, nothing stored', async () => {
      const photo = await skeinPhoto('#2d6f86');
      await expectRefusal(
        shareForm(
          Array.from({ length: 5 }, () => photo),
          baseDetails,
        ),
        400,
        'VALIDATION_FAILED',
        /one to 4 photos/,
      );
    });

    it('a good photo with a text file posing as the second → 415 naming it, nothing stored', async () => {
      const error = await expectRefusal(
        shareForm([await skeinPhoto('#2d6f86'), notAnImage], baseDetails),
        415,
        'UNSUPPORTED_MEDIA_TYPE',
        /^Photo 2: .*not a JPEG, PNG or WebP/,
      );
      expect(Object.keys(error.fields ?? {})).toEqual(['photos.1']);
    });

    it('a polyglot photo → 422, nothing stored', async () => {
      const polyglot = Buffer.concat([await skeinPhoto('#2d6f86'), Buffer.from(HIDDEN_SCRIPT)]);
      await expectRefusal(
        shareForm([polyglot], baseDetails),
        422,
        'UNPROCESSABLE_IMAGE',
        /extra data/,
      );
    });

    it('no photo, bad details, a colorway from elsewhere, crops that do not match → 400', async () => {
      const photo = await skeinPhoto('#2d6f86');
      await expectRefusal(shareForm([], baseDetails), 400, 'VALIDATION_FAILED', /No photo/);
      await expectRefusal(shareForm([photo], '{"baseName":'), 400, 'BAD_JSON', /details/);
      await expectRefusal(
        shareForm([photo], { ...baseDetails, baseName: '' }),
        400,
        'VALIDATION_FAILED',
        /details/,
      );
      await expectRefusal(
        shareForm([photo], { ...baseDetails, colorwayId: month.inspiration.id }),
        400,
        'VALIDATION_FAILED',
        /colorway/,
      );
      await expectRefusal(
        shareForm([photo], { ...baseDetails, crops: [YARN_ON_LEFT, RIGHT_HALF] }),
        400,
        'VALIDATION_FAILED',
        /yarn area once for each photo/,
      );
      await expectRefusal(
        shareForm([photo], { ...baseDetails, crops: [{ x: 0.8, y: 0, width: 0.5, height: 1 }] }),
        400,
        'VALIDATION_FAILED',
        /details/,
      );
    });
  });

  it('closeness: the marked yarn area against the inspiration palette, in kind words', async () => {
    const yarn = '#2d6f86';
    // Expected by hand: ΔE2000 (Sharma, Wu & Dalal 2005, via dye-kit) from the yarn color to the
    // nearest swatch of the stored inspiration palette, put in the reference bands.
    const nearest = Math.min(
      ...month.inspiration.palette.map((s) => deltaE2000(hexToLab(yarn), s.lab)),
    );
    expect(nearest).toBeGreaterThan(5.5);
    expect(nearest).toBeLessThan(9.5);
    const close = await share(cast.clients.viewer, cast, month.dyeAlong.id, { yarnHex: yarn });
    expect(close.closeness).toEqual({
      band: 'close',
      message: 'Close to the inspiration, with a touch of its own.',
    });
    expect(JSON.stringify(close)).not.toMatch(/deltaE|score/i);
    const magenta = await share(cast.clients.viewer, cast, month.dyeAlong.id, {
      details: { crops: [RIGHT_HALF] },
    });
    expect(magenta.closeness?.band).toBe('ownStory');
  });

  describe('my skeins', () => {
    it('lists only my own, newest first; others get 404 for mine', async () => {
      const a = await share(cast.clients.viewer, cast, month.dyeAlong.id);
      const theirs = await share(cast.clients.moderator, cast, month.dyeAlong.id);
      const res = await cast.clients.viewer.request(
        'GET',
        mine(`?dyeAlongId=${month.dyeAlong.id}&limit=100`),
      );
      const list = (await res.json()) as SubmissionList;
      expect(list.items[0]!.id).toBe(a.id);
      expect(list.items.some((s) => s.id === theirs.id)).toBe(false);
      expect(list.page.total).toBe(list.items.length);
      for (const method of ['GET', 'PATCH', 'DELETE']) {
        const r = await cast.clients.viewer.request(
          method,
          mine(`/${theirs.id}`),
          method === 'PATCH' ? { notes: 'mine now' } : undefined,
        );
        expect(r.status, method).toBe(404);
      }
      // The moderator's skein is untouched.
      const [row] = await server.deps.database.db
        .select()
        .from(submissions)
        .where(eq(submissions.id, theirs.id));
      expect(row?.notes).toBe(baseDetails.notes);
    });

    it('shows each status with the reason; an edit after "needs changes" goes back to waiting', async () => {
      const skein = await share(cast.clients.viewer, cast, month.dyeAlong.id);
      const review = (body: unknown) =>
        cast.clients.moderator.request(
          'POST',
          `/api/studios/${cast.slug}/review/submissions/${skein.id}/decisions`,
          body,
        );
      expect((await review({ decision: 'needsChanges', reasonTemplate: 'blurry' })).status).toBe(
        200,
      );
      const sentBack = (await (
        await cast.clients.viewer.request('GET', mine(`/${skein.id}`))
      ).json()) as Submission;
      expect(sentBack.status).toBe('needsChanges');
      expect(sentBack.reason).toMatch(/a little blurry/);

      const edited = await cast.clients.viewer.request('PATCH', mine(`/${skein.id}`), {
        notes: 'A sharper photo and a closer crop.',
        crops: [{ photoId: skein.photos[0]!.id, crop: RIGHT_HALF }],
      });
      expect(edited.status).toBe(200);
      const after = (await edited.json()) as Submission;
      expect(after).toMatchObject({
        status: 'waiting',
        reason: null,
        notes: 'A sharper photo and a closer crop.',
      });
      expect(new Date(after.waitingSince) > new Date(sentBack.waitingSince)).toBe(true);
      expect(after.photos[0]!.yarnCrop).toEqual(RIGHT_HALF);
      expect(after.closeness?.band).toBe('ownStory'); // recomputed from the new yarn area

      expect((await review({ decision: 'approve' })).status).toBe(200);
      const locked = await cast.clients.viewer.request('PATCH', mine(`/${skein.id}`), {
        notes: 'x',
      });
      expect(locked.status).toBe(409);
      const approved = (await (
        await cast.clients.viewer.request('GET', mine(`/${skein.id}`))
      ).json()) as Submission;
      expect(approved.status).toBe('approved');
    });

    it('withdraw removes the objects from the store and the row from every page', async () => {
      const skein = await share(cast.clients.viewer, cast, month.dyeAlong.id, { photos: 3 });
      const before = await storedSkeins(server, cast.studioId);
      const res = await cast.clients.viewer.request('DELETE', mine(`/${skein.id}`));
      expect(res.status).toBe(204);
      expect(await storedSkeins(server, cast.studioId)).toEqual({
        objects: before.objects - 6,
        rows: before.rows - 1,
      });
      expect((await cast.clients.viewer.request('GET', mine(`/${skein.id}`))).status).toBe(404);
      expect((await cast.clients.viewer.request('GET', skein.photos[0]!.webUrl)).status).toBe(404);
      const queue = await cast.clients.moderator.request(
        'GET',
        `/api/studios/${cast.slug}/review/submissions?limit=100`,
      );
      expect(JSON.stringify(await queue.json())).not.toContain(skein.id);
    });
  });
});
