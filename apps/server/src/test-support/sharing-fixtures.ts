import sharp from 'sharp';
import type { DyeAlongDetail } from '@vatside/contracts/dye-alongs';
import type { Submission, SubmissionCreate } from '@vatside/contracts/submissions';
import type { Image } from '@vatside/contracts/workbench-images';
import { count, eq } from '@vatside/db/sql';
import { submissions } from '@vatside/db/schema';
import type { RunningServer } from '../server.ts';
import { countObjects } from '../uploads/test-bucket.ts';
import { bandedPng } from '../uploads/test-images.ts';
import type { TestClient } from './client.ts';
import { inDays, makeDyeAlong, makeMonth } from './dye-along-fixtures.ts';
import type { Cast } from './personas.ts';

// A month open for sharing (inspiration image of three known bands, one colorway), and skein
// photos drawn in code: the yarn in one color on the left half, something else on the right.

export const YARN_ON_LEFT = { x: 0, y: 0, width: 0.5, height: 1 };
export const RIGHT_HALF = { x: 0.5, y: 0, width: 0.5, height: 1 };

export interface SharingMonth {
  dyeAlong: DyeAlongDetail;
  colorwayId: string;
  inspiration: Image;
}

export async function makeSharingMonth(
  host: TestClient,
  slug: string,
  window: { shareOpensAt?: string | null; shareClosesAt?: string | null } = {},
): Promise<SharingMonth> {
  const { colorway } = await makeMonth(host, slug);
  const form = new FormData();
  form.append('purpose', 'inspiration');
  form.append(
    'image',
    new Blob([new Uint8Array(await bandedPng())], { type: 'image/png' }),
    'pool.png',
  );
  const uploaded = await host.request('POST', `/api/studios/${slug}/images`, form);
  if (uploaded.status !== 201) throw new Error(`inspiration upload ${uploaded.status}`);
  const inspiration = (await uploaded.json()) as Image;
  const dyeAlong = await makeDyeAlong(host, slug, {
    startsAt: inDays(2).toISOString(),
    colorwayIds: [colorway.id],
    inspirationImageId: inspiration.id,
    shareOpensAt: new Date(Date.now() - 60_000).toISOString(),
    ...window,
  });
  const announced = await host.request(
    'POST',
    `/api/studios/${slug}/dye-alongs/${dyeAlong.id}/transitions`,
    { to: 'announced' },
  );
  if (announced.status !== 200)
    throw new Error(`announce ${announced.status}: ${await announced.text()}`);
  return { dyeAlong, colorwayId: colorway.id, inspiration };
}

/** A photo of a skein: the yarn color fills the left half, `elsewhere` the right. */
export async function skeinPhoto(
  yarnHex: string,
  elsewhere = '#d81b9a',
  width = 240,
  height = 160,
): Promise<Buffer> {
  const half = await sharp({
    create: { width: width / 2, height, channels: 3, background: yarnHex },
  })
    .png()
    .toBuffer();
  return sharp({ create: { width, height, channels: 3, background: elsewhere } })
    .composite([{ input: half, left: 0, top: 0 }])
    .jpeg({ quality: 95 })
    .toBuffer();
}

export function shareForm(photos: Uint8Array[], details: SubmissionCreate | string): FormData {
  const form = new FormData();
  form.append('details', typeof details === 'string' ? details : JSON.stringify(details));
  for (const [i, bytes] of photos.entries()) {
    form.append(
      'photos',
      new Blob([new Uint8Array(bytes)], { type: 'image/jpeg' }),
      `skein-${i}.jpg`,
    );
  }
  return form;
}

export const sharePath = (cast: Pick<Cast, 'slug'>, dyeAlongId: string) =>
  `/api/studios/${cast.slug}/dye-alongs/${dyeAlongId}/submissions`;

export const baseDetails: SubmissionCreate = {
  baseName: 'Shoreline Sock',
  fiberContent: [
    { fiber: 'wool', pct: 75 },
    { fiber: 'nylon', pct: 25 },
  ],
  dyesUsed: ['Brinewell Blue', 'Table vinegar'],
  notes: 'Dyed on the stove a day late.',
};

/** Shares a skein through the real route and returns it (201 expected). */
export async function share(
  client: TestClient,
  cast: Pick<Cast, 'slug'>,
  dyeAlongId: string,
  opts: { yarnHex?: string; photos?: number; details?: Partial<SubmissionCreate> } = {},
): Promise<Submission> {
  const photo = await skeinPhoto(opts.yarnHex ?? '#2d6f86');
  const n = opts.photos ?? 1;
  const res = await client.request(
    'POST',
    sharePath(cast, dyeAlongId),
    shareForm(
      Array.from({ length: n }, () => photo),
      {
        ...baseDetails,
        crops: Array.from({ length: n }, () => YARN_ON_LEFT),
        ...opts.details,
      },
    ),
  );
  if (res.status !== 201) throw new Error(`share ${res.status}: ${await res.text()}`);
  return (await res.json()) as Submission;
}

/** Skein objects in the bucket and submission rows of a studio. */
export async function storedSkeins(server: RunningServer, studioId: string) {
  const [rows] = await server.deps.database.db
    .select({ n: count() })
    .from(submissions)
    .where(eq(submissions.studioId, studioId));
  return {
    objects: await countObjects(server.deps.config, `studios/${studioId}/skeins/`),
    rows: rows?.n ?? 0,
  };
}

/**
 * A phone-sized photo (default 12 megapixels, 4000 × 3000) with texture all over, so it encodes
 * and decodes like a real one rather than a flat color: blurred noise tinted toward a teal yarn.
 */
export async function largeSkeinJpeg(width = 4000, height = 3000): Promise<Buffer> {
  return sharp({
    create: {
      width,
      height,
      channels: 3,
      background: '#000000',
      noise: { type: 'gaussian', mean: 110, sigma: 40 },
    },
  })
    .blur(1.2)
    .tint('#2d6f86')
    .jpeg({ quality: 88 })
    .toBuffer();
}
