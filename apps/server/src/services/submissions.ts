import { randomUUID } from 'node:crypto';
import { and, asc, desc, eq } from '@vatside/db/sql';
import type {
  Submission,
  SubmissionList,
  consentSchema,
  mySubmissionsQuerySchema,
  submissionCreateSchema,
  submissionUpdateSchema,
} from '@vatside/contracts/submissions';
import { WHOLE_PHOTO } from '@vatside/contracts/submissions';
import type { Database } from '@vatside/db/client';
import {
  colorways,
  dyeAlongColorways,
  images,
  submissionPhotos,
  submissions,
  type YarnCrop,
} from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import type { ObjectStore } from '../storage/object-store.ts';
import { processImage, type ProcessedImage } from '../uploads/process-image.ts';
import { putAll } from '../uploads/store-renditions.ts';
import { dyeAlongRow, type DyeAlongRow } from './dye-alongs.ts';
import { recordDecision } from './review-record.ts';
import { checkShareLimits, lockSharer, type ShareLimits } from './share-limits.ts';
import { sharingWindow } from '@vatside/contracts/sharing-window';
import {
  inspirationPalette,
  skeinCloseness,
  yarnAreaPalette,
  yarnSamplesPalette,
} from './skein-closeness.ts';
import { loadSubmissions, toSubmission } from './submission-view.ts';
import { pageInfo, unknownReference } from './workbench-common.ts';

// A viewer's own shared skeins: share (photos through the upload pipeline), list, edit, say yes
// or no to being featured, and withdraw (objects and rows gone). Every query is scoped to the
// sharer: nobody reaches someone else's skein through these.

type CreateInput = z.output<typeof submissionCreateSchema>;
type UpdateInput = z.output<typeof submissionUpdateSchema>;

export interface StudioRef {
  id: string;
  slug: string;
}

/** The dye-along, if sharing is open for it now; a plain 409 saying why when it is not. */
export async function dyeAlongOpenForSharing(
  db: Database,
  studioId: string,
  dyeAlongId: string,
  now = new Date(),
): Promise<DyeAlongRow> {
  const row = await dyeAlongRow(db, studioId, dyeAlongId);
  if (row.status === 'draft') throw notFound('That dye-along');
  const window = sharingWindow(row, now);
  if (!window.open) throw new HttpError(409, 'CONFLICT', window.reason);
  return row;
}

async function checkMonthColorway(db: Database, dyeAlongId: string, colorwayId: string | null) {
  if (!colorwayId) return;
  const [found] = await db
    .select({ id: dyeAlongColorways.colorwayId })
    .from(dyeAlongColorways)
    .where(
      and(
        eq(dyeAlongColorways.dyeAlongId, dyeAlongId),
        eq(dyeAlongColorways.colorwayId, colorwayId),
      ),
    );
  if (!found) throw unknownReference('colorwayId', "month's colorway");
}

/** The month's palette to compare with: its inspiration image's, else its colorways' targets. */
async function monthPalette(db: Database, dyeAlong: DyeAlongRow) {
  const [image] = dyeAlong.inspirationImageId
    ? await db
        .select({ palette: images.palette })
        .from(images)
        .where(eq(images.id, dyeAlong.inspirationImageId))
    : [];
  const targets = await db
    .select({ swatches: colorways.targetSwatches })
    .from(dyeAlongColorways)
    .innerJoin(colorways, eq(colorways.id, dyeAlongColorways.colorwayId))
    .where(eq(dyeAlongColorways.dyeAlongId, dyeAlong.id));
  return inspirationPalette(
    image?.palette ?? null,
    targets.flatMap((t) => t.swatches.map((s) => s.hex)),
  );
}

/**
 * Runs each photo through the pipeline in turn, its marked yarn area read in the same pass; a
 * refusal names the photo and stores nothing.
 */
async function processPhotos(
  files: Uint8Array[],
  crops: YarnCrop[],
  maxPixels: number,
): Promise<ProcessedImage[]> {
  const out: ProcessedImage[] = [];
  for (const [i, file] of files.entries()) {
    try {
      out.push(await processImage(file, { maxPixels, swatchCount: 0, sampleArea: crops[i] }));
    } catch (error) {
      if (!(error instanceof HttpError)) throw error;
      throw new HttpError(error.status, error.code, `Photo ${i + 1}: ${error.message}`, {
        [`photos.${i}`]: [error.message],
      });
    }
  }
  return out;
}

const skeinKeys = (studioId: string) => {
  const prefix = `studios/${studioId}/skeins/${randomUUID()}`;
  return { webKey: `${prefix}/web.jpg`, thumbKey: `${prefix}/thumb.jpg` };
};

async function deleteObjects(store: ObjectStore, keys: string[]) {
  await Promise.allSettled(keys.map((k) => store.delete(k)));
}

async function getOwn(db: Database, studio: StudioRef, sharerId: string, id: string) {
  const { items } = await loadSubmissions(
    db,
    and(
      eq(submissions.studioId, studio.id),
      eq(submissions.sharerUserId, sharerId),
      eq(submissions.id, id),
    ),
    [],
    { limit: 1, offset: 0 },
  );
  if (!items[0]) throw notFound('That skein');
  return items[0];
}

export async function shareSkein(
  db: Database,
  store: ObjectStore,
  share: {
    studio: StudioRef;
    dyeAlong: DyeAlongRow;
    sharerId: string;
    files: Uint8Array[];
    input: CreateInput;
    maxPixels: number;
    limits: ShareLimits;
  },
): Promise<Submission> {
  const { studio, dyeAlong, input, files } = share;
  const who = { studioId: studio.id, sharerId: share.sharerId };
  const crops: YarnCrop[] = input.crops ?? files.map(() => WHOLE_PHOTO);
  if (crops.length !== files.length) {
    throw new HttpError(400, 'VALIDATION_FAILED', 'Mark the yarn area once for each photo.', {
      crops: [`${files.length} photos came with ${crops.length} yarn areas.`],
    });
  }
  await checkMonthColorway(db, dyeAlong.id, input.colorwayId);
  const processed = await processPhotos(files, crops, share.maxPixels);
  const yarnPalette = yarnSamplesPalette(processed.map((p) => p.areaSample));
  const closeness = skeinCloseness(yarnPalette, await monthPalette(db, dyeAlong));
  // Their stored size is known now: refused here, nothing reaches the store.
  const storedBytes = processed.reduce((total, p) => total + p.web.data.length, 0);
  await checkShareLimits(db, who, share.limits, storedBytes);

  // Every object is put before the rows are written; any failure deletes every key again.
  const keys = processed.map(() => skeinKeys(studio.id));
  let id: string;
  try {
    await putAll(
      store,
      processed.flatMap((p, i) => [
        { key: keys[i]!.webKey, rendition: p.web },
        { key: keys[i]!.thumbKey, rendition: p.thumb },
      ]),
    );
    id = await db.transaction(async (tx) => {
      // Again under a per-sharer lock: two shares at once, in any process, cannot both fit.
      await lockSharer(tx, who);
      await checkShareLimits(tx, who, share.limits, storedBytes);
      const [row] = await tx
        .insert(submissions)
        .values({
          studioId: studio.id,
          dyeAlongId: dyeAlong.id,
          sharerUserId: share.sharerId,
          colorwayId: input.colorwayId,
          baseName: input.baseName,
          fiberContent: input.fiberContent,
          dyesUsed: input.dyesUsed,
          notes: input.notes,
          consentToFeature: input.consentToFeature,
          yarnPalette,
          closenessBand: closeness?.band ?? null,
          closenessMessage: closeness?.message ?? null,
        })
        .returning({ id: submissions.id });
      await tx.insert(submissionPhotos).values(
        processed.map((p, i) => ({
          submissionId: row!.id,
          position: i + 1,
          ...keys[i]!,
          contentType: p.web.contentType,
          width: p.web.width,
          height: p.web.height,
          bytes: p.web.data.length,
          thumbWidth: p.thumb.width,
          thumbHeight: p.thumb.height,
          yarnCrop: crops[i]!,
        })),
      );
      return row!.id;
    });
  } catch (error) {
    await deleteObjects(
      store,
      keys.flatMap((k) => [k.webKey, k.thumbKey]),
    );
    throw error;
  }
  return toSubmission(await getOwn(db, studio, share.sharerId, id), studio.slug);
}

export async function listMySubmissions(
  db: Database,
  studio: StudioRef,
  sharerId: string,
  query: z.output<typeof mySubmissionsQuerySchema>,
): Promise<SubmissionList> {
  const { items, total } = await loadSubmissions(
    db,
    and(
      eq(submissions.studioId, studio.id),
      eq(submissions.sharerUserId, sharerId),
      query.dyeAlongId ? eq(submissions.dyeAlongId, query.dyeAlongId) : undefined,
    ),
    [desc(submissions.createdAt), asc(submissions.id)],
    query,
  );
  return { items: items.map((s) => toSubmission(s, studio.slug)), page: pageInfo(query, total) };
}

export async function getMySubmission(
  db: Database,
  studio: StudioRef,
  sharerId: string,
  id: string,
): Promise<Submission> {
  return toSubmission(await getOwn(db, studio, sharerId, id), studio.slug);
}

/** Editable while waiting or sent back; an edit of a skein sent back queues it again. */
export async function updateMySubmission(
  db: Database,
  store: ObjectStore,
  studio: StudioRef,
  sharerId: string,
  id: string,
  patch: UpdateInput,
): Promise<Submission> {
  const current = await getOwn(db, studio, sharerId, id);
  if (patch.colorwayId !== undefined)
    await checkMonthColorway(db, current.row.dyeAlongId, patch.colorwayId);
  let recomputed: Partial<typeof submissions.$inferInsert> = {};
  const newCrops = new Map(patch.crops?.map((c) => [c.photoId, c.crop]));
  if (patch.crops) {
    const known = new Set(current.photos.map((p) => p.id));
    const unknown = patch.crops.findIndex((c) => !known.has(c.photoId));
    if (unknown >= 0) throw unknownReference(`crops.${unknown}.photoId`, 'photo of this skein');
    const marked = await Promise.all(
      current.photos.map(async (p) => ({
        web: await store.getBytes(p.webKey),
        crop: newCrops.get(p.id) ?? p.yarnCrop,
      })),
    );
    const yarnPalette = await yarnAreaPalette(marked);
    const dyeAlong = await dyeAlongRow(db, studio.id, current.row.dyeAlongId);
    const closeness = skeinCloseness(yarnPalette, await monthPalette(db, dyeAlong));
    recomputed = {
      yarnPalette,
      closenessBand: closeness?.band ?? null,
      closenessMessage: closeness?.message ?? null,
    };
  }
  await db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(submissions)
      .where(and(eq(submissions.id, id), eq(submissions.sharerUserId, sharerId)))
      .for('update');
    if (!row) throw notFound('That skein');
    if (row.status !== 'waiting' && row.status !== 'needsChanges') {
      throw new HttpError(
        409,
        'CONFLICT',
        `This skein has been reviewed (${row.status}); to change it, withdraw it and share it again.`,
      );
    }
    await tx
      .update(submissions)
      .set({
        ...(patch.colorwayId !== undefined ? { colorwayId: patch.colorwayId } : {}),
        ...(patch.baseName !== undefined ? { baseName: patch.baseName } : {}),
        ...(patch.fiberContent !== undefined ? { fiberContent: patch.fiberContent } : {}),
        ...(patch.dyesUsed !== undefined ? { dyesUsed: patch.dyesUsed } : {}),
        ...(patch.notes !== undefined ? { notes: patch.notes } : {}),
        ...recomputed,
        ...(row.status === 'needsChanges'
          ? { status: 'waiting' as const, reason: null, waitingSince: new Date() }
          : {}),
      })
      .where(eq(submissions.id, id));
    for (const [photoId, crop] of newCrops) {
      await tx
        .update(submissionPhotos)
        .set({ yarnCrop: crop })
        .where(and(eq(submissionPhotos.id, photoId), eq(submissionPhotos.submissionId, id)));
    }
  });
  return getMySubmission(db, studio, sharerId, id);
}

/** Consent can change at any time; saying no to a featured skein unfeatures it (audited). */
export async function setConsent(
  db: Database,
  studio: StudioRef,
  sharerId: string,
  id: string,
  { consentToFeature }: z.output<typeof consentSchema>,
): Promise<Submission> {
  await db.transaction(async (tx) => {
    const [row] = await tx
      .select()
      .from(submissions)
      .where(
        and(
          eq(submissions.studioId, studio.id),
          eq(submissions.id, id),
          eq(submissions.sharerUserId, sharerId),
        ),
      )
      .for('update');
    if (!row) throw notFound('That skein');
    const unfeature = !consentToFeature && row.status === 'featured';
    await tx
      .update(submissions)
      .set({ consentToFeature, ...(unfeature ? { status: 'approved' as const } : {}) })
      .where(eq(submissions.id, id));
    if (unfeature) {
      await recordDecision(tx, row, {
        action: 'unfeature',
        to: 'approved',
        reason: 'The maker withdrew consent to be featured.',
        actorUserId: sharerId,
      });
    }
  });
  return getMySubmission(db, studio, sharerId, id);
}

/**
 * Removes the skein from every page: its photos' objects, its rows, its recap item and unsent
 * e-mails (cascade). If the store refuses a delete the transaction rolls back and nothing is lost.
 */
export async function withdrawSubmission(
  db: Database,
  store: ObjectStore,
  studio: StudioRef,
  sharerId: string,
  id: string,
): Promise<void> {
  await db.transaction(async (tx) => {
    const photos = await tx
      .select({ webKey: submissionPhotos.webKey, thumbKey: submissionPhotos.thumbKey })
      .from(submissionPhotos)
      .innerJoin(submissions, eq(submissions.id, submissionPhotos.submissionId))
      .where(
        and(
          eq(submissions.studioId, studio.id),
          eq(submissions.id, id),
          eq(submissions.sharerUserId, sharerId),
        ),
      )
      .for('update');
    const [row] = await tx
      .delete(submissions)
      .where(
        and(
          eq(submissions.studioId, studio.id),
          eq(submissions.id, id),
          eq(submissions.sharerUserId, sharerId),
        ),
      )
      .returning({ id: submissions.id });
    if (!row) throw notFound('That skein');
    for (const photo of photos) {
      await store.delete(photo.webKey);
      await store.delete(photo.thumbKey);
    }
  });
}

/** Where a photo's rendition is stored, with what decides who may see it. */
export async function submissionPhotoOf(
  db: Database,
  studioId: string,
  submissionId: string,
  photoId: string,
  which: 'web' | 'thumb',
) {
  const [found] = await db
    .select({
      photo: submissionPhotos,
      status: submissions.status,
      sharerUserId: submissions.sharerUserId,
    })
    .from(submissionPhotos)
    .innerJoin(submissions, eq(submissions.id, submissionPhotos.submissionId))
    .where(
      and(
        eq(submissions.studioId, studioId),
        eq(submissions.id, submissionId),
        eq(submissionPhotos.id, photoId),
      ),
    );
  if (!found) throw notFound('That photo');
  return {
    key: which === 'web' ? found.photo.webKey : found.photo.thumbKey,
    contentType: found.photo.contentType,
    status: found.status,
    sharerUserId: found.sharerUserId,
  };
}
