import { and, count, desc, eq } from '@vatside/db/sql';
import type {
  Image,
  ImageList,
  ImagePurpose,
  imageListQuerySchema,
  paletteEditSchema,
  palettePickSchema,
} from '@vatside/contracts/workbench-images';
import type { Database } from '@vatside/db/client';
import { images, type StoredSwatch } from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import { swatchAt, type ProcessedImage } from '../uploads/process-image.ts';
import { newRenditionKeys, storeRenditions } from '../uploads/store-renditions.ts';
import { findColorway } from './workbench-colorways.ts';
import { isoTimestamps, pageInfo, unknownReference } from './workbench-common.ts';

// Images from the upload pipeline: rows, renditions in the object store, and palettes.

type ImageRow = typeof images.$inferSelect;

/** More swatches than this stop being a palette. */
const MAX_SWATCHES = 16;

const toImage = (row: ImageRow, slug: string): Image => {
  const base = `/api/studios/${slug}/images/${row.id}`;
  return {
    id: row.id,
    purpose: row.purpose,
    colorwayId: row.colorwayId,
    contentType: row.contentType,
    width: row.width,
    height: row.height,
    bytes: row.bytes,
    thumbWidth: row.thumbWidth,
    thumbHeight: row.thumbHeight,
    palette: row.palette,
    webUrl: `${base}/web`,
    thumbUrl: `${base}/thumb`,
    ...isoTimestamps(row),
  };
};

export interface StudioRef {
  id: string;
  slug: string;
}

const inStudio = (studioId: string, id: string) =>
  and(eq(images.studioId, studioId), eq(images.id, id));

async function imageRow(db: Database, studioId: string, imageId: string) {
  const [row] = await db.select().from(images).where(inStudio(studioId, imageId));
  if (!row) throw notFound('That image');
  return row;
}

export async function listImages(
  db: Database,
  studio: StudioRef,
  query: z.output<typeof imageListQuerySchema>,
): Promise<ImageList> {
  const where = and(
    eq(images.studioId, studio.id),
    query.purpose ? eq(images.purpose, query.purpose) : undefined,
    query.colorwayId ? eq(images.colorwayId, query.colorwayId) : undefined,
  );
  const [rows, [total]] = await Promise.all([
    db
      .select()
      .from(images)
      .where(where)
      .orderBy(desc(images.createdAt), desc(images.id))
      .limit(query.limit)
      .offset(query.offset),
    db.select({ n: count() }).from(images).where(where),
  ]);
  return { items: rows.map((r) => toImage(r, studio.slug)), page: pageInfo(query, total?.n ?? 0) };
}

export async function getImage(db: Database, studio: StudioRef, imageId: string): Promise<Image> {
  return toImage(await imageRow(db, studio.id, imageId), studio.slug);
}

/** Checked before the pipeline runs, so a wrong colorway costs no decoding. */
export async function checkImageTarget(
  db: Database,
  studioId: string,
  colorwayId: string | undefined,
): Promise<void> {
  if (colorwayId && !(await findColorway(db, studioId, colorwayId)))
    throw unknownReference('colorwayId', 'colorway');
}

export async function createImage(
  db: Database,
  store: ObjectStore,
  studio: StudioRef,
  upload: {
    purpose: ImagePurpose;
    colorwayId: string | undefined;
    uploadedBy: string;
    processed: ProcessedImage;
  },
): Promise<Image> {
  const { web, thumb, palette } = upload.processed;
  const keys = newRenditionKeys(studio.id);
  const row = await storeRenditions(store, keys, { web, thumb }, async () => {
    const [inserted] = await db
      .insert(images)
      .values({
        studioId: studio.id,
        purpose: upload.purpose,
        colorwayId: upload.colorwayId ?? null,
        ...keys,
        contentType: web.contentType,
        width: web.width,
        height: web.height,
        bytes: web.data.length,
        thumbWidth: thumb.width,
        thumbHeight: thumb.height,
        palette,
        uploadedBy: upload.uploadedBy,
      })
      .returning();
    return inserted!;
  });
  return toImage(row, studio.slug);
}

/** Removes the row and both objects together: if the store refuses, the row stays. */
export async function deleteImage(
  db: Database,
  store: ObjectStore,
  studioId: string,
  imageId: string,
): Promise<void> {
  await db.transaction(async (tx) => {
    const [row] = await tx.delete(images).where(inStudio(studioId, imageId)).returning();
    if (!row) throw notFound('That image');
    await store.delete(row.webKey);
    await store.delete(row.thumbKey);
  });
}

/** Read-modify-write of a palette under a row lock, so two edits cannot overwrite each other. */
async function changePalette(
  db: Database,
  studio: StudioRef,
  imageId: string,
  change: (palette: StoredSwatch[]) => StoredSwatch[],
): Promise<Image> {
  const row = await db.transaction(async (tx) => {
    const [current] = await tx
      .select()
      .from(images)
      .where(inStudio(studio.id, imageId))
      .for('update');
    if (!current) throw notFound('That image');
    const [updated] = await tx
      .update(images)
      .set({ palette: change(current.palette) })
      .where(eq(images.id, imageId))
      .returning();
    return updated!;
  });
  return toImage(row, studio.slug);
}

/** Keeps the listed swatches in the listed order with their new names; the rest are deleted. */
export function editPalette(
  db: Database,
  studio: StudioRef,
  imageId: string,
  edit: z.output<typeof paletteEditSchema>,
): Promise<Image> {
  return changePalette(db, studio, imageId, (palette) => {
    const byId = new Map(palette.map((s) => [s.id, s]));
    const unknown = edit.swatches.filter((s) => !byId.has(s.id));
    if (unknown.length > 0) {
      throw new HttpError(400, 'VALIDATION_FAILED', 'Some swatches are not in this palette.', {
        swatches: [`Unknown swatch ids: ${unknown.map((s) => s.id).join(', ')}.`],
      });
    }
    return edit.swatches.map(({ id, label }) => ({ ...byId.get(id)!, label }));
  });
}

const paletteFull = () =>
  new HttpError(
    409,
    'CONFLICT',
    `A palette holds at most ${MAX_SWATCHES} swatches; delete one first.`,
  );

/** Adds the color under a point of the web rendition as a new swatch at the end. */
export async function pickSwatch(
  db: Database,
  store: ObjectStore,
  studio: StudioRef,
  imageId: string,
  pick: z.output<typeof palettePickSchema>,
): Promise<Image> {
  const row = await imageRow(db, studio.id, imageId);
  if (row.palette.length >= MAX_SWATCHES) throw paletteFull();
  // Sampled before the lock: the rendition under a key never changes.
  const swatch = await swatchAt(await store.getBytes(row.webKey), pick.x, pick.y, pick.label);
  return changePalette(db, studio, imageId, (palette) => {
    if (palette.length >= MAX_SWATCHES) throw paletteFull();
    return [...palette, swatch];
  });
}

/** Where a rendition is stored and its type as we recorded it (never what the uploader said). */
export async function renditionOf(
  db: Database,
  studioId: string,
  imageId: string,
  which: 'web' | 'thumb',
) {
  const row = await imageRow(db, studioId, imageId);
  return { key: which === 'web' ? row.webKey : row.thumbKey, contentType: row.contentType };
}
