import exifr from 'exifr';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { errorBodySchema } from '@vatside/contracts/errors';
import type { Image, ImageList } from '@vatside/contracts/workbench-images';
import { deltaE2000, hexToLab } from '@vatside/dye-kit';
import { count, eq } from '@vatside/db/sql';
import { images } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { castStudio, type Cast } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';
import { countObjects } from '../uploads/test-bucket.ts';
import {
  HIDDEN_SCRIPT,
  TIDE_BANDS,
  bandedPng,
  jpegWithGps,
  notAnImage,
  pngDeclaring,
  svgImage,
} from '../uploads/test-images.ts';

const MAX_BYTES = 400_000;

function form(bytes: Uint8Array, name: string, type: string, fields: Record<string, string> = {}) {
  const body = new FormData();
  for (const [k, v] of Object.entries(fields)) body.append(k, v);
  body.append('image', new Blob([bytes], { type }), name);
  return body;
}

describe('images: upload pipeline through the API', () => {
  let server: RunningServer;
  let cast: Cast;
  let path: string;

  const stored = async () => ({
    objects: await countObjects(server.deps.config, `studios/${cast.studioId}/`),
    rows: (
      await server.deps.database.db
        .select({ n: count() })
        .from(images)
        .where(eq(images.studioId, cast.studioId))
    )[0]?.n,
  });

  const upload = (body: FormData) => cast.clients.host.request('POST', path, body);

  beforeAll(async () => {
    server = await startTestServer({ UPLOAD_MAX_BYTES: String(MAX_BYTES) });
    cast = await castStudio(server, 'images');
    path = `/api/studios/${cast.slug}/images`;
  });
  afterAll(() => server.close());

  async function expectRefusal(body: FormData, status: number, code: string, message: RegExp) {
    const before = await stored();
    const res = await upload(body);
    expect(res.status).toBe(status);
    const error = errorBodySchema.parse(await res.json()).error;
    expect(error.code).toBe(code);
    expect(error.message).toMatch(message);
    expect(await stored()).toEqual(before);
  }

  describe('refusals leave nothing in the store or the database', () => {
    it('a text file named .jpg and declared image/jpeg → 415', () =>
      expectRefusal(
        form(notAnImage, 'skein.jpg', 'image/jpeg'),
        415,
        'UNSUPPORTED_MEDIA_TYPE',
        /not a JPEG, PNG or WebP/,
      ));

    it('an SVG → 415', () =>
      expectRefusal(
        form(svgImage, 'pool.svg', 'image/svg+xml'),
        415,
        'UNSUPPORTED_MEDIA_TYPE',
        /JPEG/,
      ));

    it('a polyglot (a valid PNG followed by HTML and script) → 422', async () => {
      const polyglot = Buffer.concat([await bandedPng(60, 30), Buffer.from(HIDDEN_SCRIPT)]);
      await expectRefusal(
        form(polyglot, 'pool.png', 'image/png'),
        422,
        'UNPROCESSABLE_IMAGE',
        /extra data after the picture/,
      );
    });

    it('a file over the size limit → 413 from multer', () => {
      const big = Buffer.alloc(MAX_BYTES + 50_000, 7);
      big.set([0xff, 0xd8, 0xff, 0xe0]);
      return expectRefusal(
        form(big, 'big.jpg', 'image/jpeg'),
        413,
        'PAYLOAD_TOO_LARGE',
        /larger than/,
      );
    });

    it('a tiny PNG declaring 30000 × 30000 pixels → 422', () =>
      expectRefusal(
        form(pngDeclaring(30_000, 30_000), 'bomb.png', 'image/png'),
        422,
        'UNPROCESSABLE_IMAGE',
        /megapixels/,
      ));

    it('no file at all → 400 naming the field', async () => {
      const body = new FormData();
      body.append('purpose', 'inspiration');
      const res = await upload(body);
      expect(res.status).toBe(400);
      expect(errorBodySchema.parse(await res.json()).error.fields).toHaveProperty('image');
    });

    it('two files → 400', async () => {
      const png = await bandedPng(30, 30);
      const body = form(png, 'a.png', 'image/png');
      body.append('image', new Blob([png], { type: 'image/png' }), 'b.png');
      await expectRefusal(body, 400, 'VALIDATION_FAILED', /refused/);
    });

    it('a colorway photo without its colorway → 400', () =>
      bandedPng(30, 30).then((png) =>
        expectRefusal(
          form(png, 'a.png', 'image/png', { purpose: 'colorwayPhoto' }),
          400,
          'VALIDATION_FAILED',
          /invalid fields/,
        ),
      ));
  });

  describe('an accepted inspiration image', () => {
    let image: Image;

    beforeAll(async () => {
      const before = await stored();
      const res = await upload(form(await bandedPng(), 'tide-pool.png', 'image/png'));
      expect(res.status).toBe(201);
      image = (await res.json()) as Image;
      expect(await stored()).toEqual({ objects: before.objects + 2, rows: (before.rows ?? 0) + 1 });
    });

    it('has its palette: each band of the picture is a swatch', () => {
      expect(image).toMatchObject({
        purpose: 'inspiration',
        contentType: 'image/jpeg',
        width: 300,
      });
      for (const hex of TIDE_BANDS) {
        expect(image.palette.some((s) => deltaE2000(s.lab, hexToLab(hex)) < 3)).toBe(true);
      }
    });

    it('is served to staff with safe headers, re-encoded, and cached privately', async () => {
      for (const who of ['host', 'moderator'] as const) {
        const res = await cast.clients[who].request('GET', image.webUrl);
        expect(res.status).toBe(200);
        expect(res.headers.get('content-type')).toBe('image/jpeg');
        expect(res.headers.get('x-content-type-options')).toBe('nosniff');
        expect(res.headers.get('content-disposition')).toBe('inline');
        expect(res.headers.get('cache-control')).toBe('private, max-age=3600');
        const bytes = Buffer.from(await res.arrayBuffer());
        expect((await sharp(bytes).metadata()).width).toBe(300);
      }
      const etag = (await cast.clients.host.request('GET', image.thumbUrl)).headers.get('etag');
      expect(etag).toBeTruthy();
    });

    it('is refused to viewers, visitors and other studios’ hosts', async () => {
      expect((await cast.clients.viewer.request('GET', image.webUrl)).status).toBe(403);
      expect((await cast.clients.visitor.request('GET', image.thumbUrl)).status).toBe(401);
      expect((await cast.clients.otherHost.request('GET', image.webUrl)).status).toBe(403);
      const elsewhere = image.webUrl.replace(cast.slug, cast.otherSlug);
      expect((await cast.clients.otherHost.request('GET', elsewhere)).status).toBe(404);
    });

    it('is listed with pagination and a purpose filter', async () => {
      const res = await cast.clients.moderator.request(
        'GET',
        `${path}?purpose=inspiration&limit=1`,
      );
      const list = (await res.json()) as ImageList;
      expect(list.page).toMatchObject({ limit: 1, offset: 0 });
      expect(list.page.total).toBeGreaterThanOrEqual(1);
      expect(list.items).toHaveLength(1);
      const photos = await cast.clients.host.request('GET', `${path}?purpose=colorwayPhoto`);
      expect(((await photos.json()) as ImageList).page.total).toBe(0);
    });

    it('palette: reorder, rename and delete swatches in one edit', async () => {
      const [first, second, ...rest] = image.palette;
      const res = await cast.clients.host.request(
        'PUT',
        `${image.webUrl.replace('/web', '')}/palette`,
        {
          swatches: [
            { id: second!.id, label: 'Wet sand' },
            { id: first!.id, label: 'Low tide' },
          ],
        },
      );
      expect(res.status).toBe(200);
      const edited = (await res.json()) as Image;
      expect(edited.palette.map((s) => [s.id, s.label])).toEqual([
        [second!.id, 'Wet sand'],
        [first!.id, 'Low tide'],
      ]);
      expect(rest.length).toBeGreaterThanOrEqual(1); // those were deleted
      image = edited;
    });

    it('palette: an unknown swatch id → 400, palette unchanged', async () => {
      const at = `${path}/${image.id}/palette`;
      const res = await cast.clients.host.request('PUT', at, {
        swatches: [{ id: '00000000-0000-4000-8000-000000000000', label: 'x' }],
      });
      expect(res.status).toBe(400);
      const again = (await (
        await cast.clients.host.request('GET', `${path}/${image.id}`)
      ).json()) as Image;
      expect(again.palette).toEqual(image.palette);
    });

    it('palette: add a swatch by picking a point on the image', async () => {
      const res = await cast.clients.host.request('POST', `${path}/${image.id}/palette/pick`, {
        x: 0.85,
        y: 0.4,
        label: 'Rust on the rocks',
      });
      expect(res.status).toBe(201);
      const picked = ((await res.json()) as Image).palette.at(-1)!;
      expect(picked).toMatchObject({ label: 'Rust on the rocks', share: null });
      expect(deltaE2000(picked.lab, hexToLab(TIDE_BANDS[2]))).toBeLessThan(3);
      const outside = await cast.clients.host.request('POST', `${path}/${image.id}/palette/pick`, {
        x: 1.5,
        y: 0.4,
      });
      expect(outside.status).toBe(400);
    });

    it('deleting it removes the row and both objects', async () => {
      const before = await stored();
      const res = await cast.clients.host.request('DELETE', `${path}/${image.id}`);
      expect(res.status).toBe(204);
      expect(await stored()).toEqual({ objects: before.objects - 2, rows: (before.rows ?? 0) - 1 });
      expect((await cast.clients.host.request('GET', image.webUrl)).status).toBe(404);
    });
  });

  it('a phone JPEG with GPS comes back from the API without any metadata', async () => {
    const input = await jpegWithGps(80, 40);
    expect(await exifr.gps(input)).toBeTruthy();
    const res = await upload(form(input, 'IMG_0001.JPG', 'image/jpeg'));
    expect(res.status).toBe(201);
    const image = (await res.json()) as Image;
    for (const url of [image.webUrl, image.thumbUrl]) {
      const bytes = Buffer.from(await (await cast.clients.host.request('GET', url)).arrayBuffer());
      expect(await exifr.parse(bytes, true)).toBeUndefined();
      expect((await sharp(bytes).metadata()).exif).toBeUndefined();
    }
    expect([image.width, image.height]).toEqual([40, 80]);
  });

  it('a colorway photo is tied to a colorway of this studio only', async () => {
    const colorway = await cast.clients.host.request(
      'POST',
      `/api/studios/${cast.slug}/colorways`,
      {
        name: 'Rock Pool',
        technique: 'immersion',
        weightOfGoodsG: 100,
      },
    );
    const { id: colorwayId } = (await colorway.json()) as { id: string };
    const png = await bandedPng(40, 40);
    const ok = await upload(
      form(png, 'skein.png', 'image/png', { purpose: 'colorwayPhoto', colorwayId }),
    );
    expect(ok.status).toBe(201);
    expect(((await ok.json()) as Image).colorwayId).toBe(colorwayId);
    const listed = await cast.clients.host.request('GET', `${path}?colorwayId=${colorwayId}`);
    expect(((await listed.json()) as ImageList).page.total).toBe(1);
    await expectRefusal(
      form(png, 'skein.png', 'image/png', {
        purpose: 'colorwayPhoto',
        colorwayId: '00000000-0000-4000-8000-000000000000',
      }),
      400,
      'VALIDATION_FAILED',
      /not in this studio/,
    );
  });
});
