import { and, asc, desc, eq, inArray, notInArray, sql } from '@vatside/db/sql';
import type {
  Gallery,
  GalleryColorway,
  GallerySkein,
  Recap,
  RecapItem,
  galleryQuerySchema,
  recapUpdateSchema,
} from '@vatside/contracts/gallery';
import type { Database } from '@vatside/db/client';
import { colorways, dyeAlongColorways, images, recapItems, submissions } from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError, notFound } from '../http/errors.ts';
import { dyeAlongApiPath } from './dye-along-view.ts';
import { loadSubmissions, toGallerySkein } from './submission-view.ts';
import type { StudioRef } from './submissions.ts';
import { pageInfo } from './workbench-common.ts';

// The month's public gallery and the host's recap running order. The gallery's one rule: only
// approved and featured skeins, whoever asks. The recap's: only featured skeins whose makers
// said yes, and the month's own colorways.

const PUBLIC_STATUSES = ['approved', 'featured'] as const;

/** The month's colorways with their target swatches and the host's newest photo of each. */
async function monthColorways(
  db: Database,
  studio: StudioRef,
  dyeAlongId: string,
): Promise<GalleryColorway[]> {
  const rows = await db
    .select({
      id: colorways.id,
      name: colorways.name,
      technique: colorways.technique,
      swatches: colorways.targetSwatches,
    })
    .from(dyeAlongColorways)
    .innerJoin(colorways, eq(colorways.id, dyeAlongColorways.colorwayId))
    .where(eq(dyeAlongColorways.dyeAlongId, dyeAlongId))
    .orderBy(asc(dyeAlongColorways.position));
  const photos = rows.length
    ? await db
        .select()
        .from(images)
        .where(
          and(
            eq(images.purpose, 'colorwayPhoto'),
            inArray(
              images.colorwayId,
              rows.map((r) => r.id),
            ),
          ),
        )
        .orderBy(desc(images.createdAt), asc(images.id))
    : [];
  return rows.map((row) => {
    const photo = photos.find((p) => p.colorwayId === row.id);
    const at = `${dyeAlongApiPath(studio.slug, dyeAlongId)}/colorways/${row.id}/photos/${photo?.id}`;
    return {
      ...row,
      swatches: row.swatches.map(({ hex, name }) => ({ hex, name })),
      photo: photo
        ? {
            width: photo.width,
            height: photo.height,
            thumbWidth: photo.thumbWidth,
            thumbHeight: photo.thumbHeight,
            webUrl: `${at}/web`,
            thumbUrl: `${at}/thumb`,
          }
        : null,
    };
  });
}

/**
 * A colorway photo's stored rendition, only when it is the host's photo of one of this month's
 * colorways (the month is already known to be past its draft).
 */
export async function monthColorwayPhoto(
  db: Database,
  dyeAlongId: string,
  colorwayId: string,
  imageId: string,
  which: 'web' | 'thumb',
) {
  const [row] = await db
    .select({ webKey: images.webKey, thumbKey: images.thumbKey, contentType: images.contentType })
    .from(images)
    .innerJoin(
      dyeAlongColorways,
      and(
        eq(dyeAlongColorways.colorwayId, images.colorwayId),
        eq(dyeAlongColorways.dyeAlongId, dyeAlongId),
      ),
    )
    .where(
      and(
        eq(images.id, imageId),
        eq(images.colorwayId, colorwayId),
        eq(images.purpose, 'colorwayPhoto'),
      ),
    );
  if (!row) throw notFound('That photo');
  return { key: which === 'web' ? row.webKey : row.thumbKey, contentType: row.contentType };
}

export async function gallery(
  db: Database,
  studio: StudioRef,
  dyeAlongId: string,
  query: z.output<typeof galleryQuerySchema>,
): Promise<Gallery> {
  const { items, total } = await loadSubmissions(
    db,
    and(
      eq(submissions.studioId, studio.id),
      eq(submissions.dyeAlongId, dyeAlongId),
      inArray(submissions.status, [...PUBLIC_STATUSES]),
      query.colorwayId ? eq(submissions.colorwayId, query.colorwayId) : undefined,
    ),
    // Featured first, then in the order they were shared; the id keeps pages stable.
    [
      sql`(${submissions.status} = 'featured') desc`,
      asc(submissions.createdAt),
      asc(submissions.id),
    ],
    query,
  );
  return {
    items: items.map((s) => toGallerySkein(s, studio.slug)),
    page: pageInfo(query, total),
    colorways: await monthColorways(db, studio, dyeAlongId),
  };
}

/** One skein of the month's gallery (its own address, to be shared); others are not found. */
export async function gallerySkein(
  db: Database,
  studio: StudioRef,
  dyeAlongId: string,
  submissionId: string,
): Promise<GallerySkein> {
  const { items } = await loadSubmissions(
    db,
    and(
      eq(submissions.studioId, studio.id),
      eq(submissions.dyeAlongId, dyeAlongId),
      eq(submissions.id, submissionId),
      inArray(submissions.status, [...PUBLIC_STATUSES]),
    ),
    [],
    { limit: 1, offset: 0 },
  );
  const [skein] = items;
  if (!skein) throw notFound('That skein');
  return toGallerySkein(skein, studio.slug);
}

/** May this skein be shown publicly? (Its photos answer anyone once this is true.) */
export const isPublicStatus = (status: string) =>
  (PUBLIC_STATUSES as readonly string[]).includes(status);

const recapEligible = (dyeAlongId: string) =>
  and(
    eq(submissions.dyeAlongId, dyeAlongId),
    eq(submissions.status, 'featured'),
    eq(submissions.consentToFeature, true),
  );

export async function getRecap(
  db: Database,
  studio: StudioRef,
  dyeAlongId: string,
): Promise<Recap> {
  const [items, cws] = await Promise.all([
    db
      .select()
      .from(recapItems)
      .where(eq(recapItems.dyeAlongId, dyeAlongId))
      .orderBy(asc(recapItems.position)),
    monthColorways(db, studio, dyeAlongId),
  ]);
  const inOrder = items.flatMap((i) => (i.submissionId ? [i.submissionId] : []));
  const [skeins, candidates] = await Promise.all([
    inOrder.length
      ? loadSubmissions(db, inArray(submissions.id, inOrder), [], {
          limit: inOrder.length,
          offset: 0,
        })
      : { items: [] },
    loadSubmissions(
      db,
      and(
        recapEligible(dyeAlongId),
        inOrder.length ? notInArray(submissions.id, inOrder) : undefined,
      ),
      [desc(submissions.updatedAt), asc(submissions.id)],
      { limit: 100, offset: 0 },
    ),
  ]);
  const skeinById = new Map(skeins.items.map((s) => [s.row.id, toGallerySkein(s, studio.slug)]));
  const colorwayById = new Map(cws.map((c) => [c.id, c]));
  const usedColorways = new Set(items.flatMap((i) => (i.colorwayId ? [i.colorwayId] : [])));
  return {
    dyeAlongId,
    items: items.flatMap((i): RecapItem[] => {
      const base = { id: i.id, position: i.position, note: i.note };
      const skein = i.submissionId ? skeinById.get(i.submissionId) : undefined;
      if (skein) return [{ ...base, kind: 'skein' as const, skein }];
      const colorway = i.colorwayId ? colorwayById.get(i.colorwayId) : undefined;
      return colorway ? [{ ...base, kind: 'colorway' as const, colorway }] : [];
    }),
    candidates: {
      skeins: candidates.items.map((s) => toGallerySkein(s, studio.slug)),
      colorways: cws.filter((c) => !usedColorways.has(c.id)),
    },
  };
}

/**
 * Replaces the running order. The skeins are read FOR SHARE: a consent withdrawn at the same
 * moment waits for this to commit and then takes its skein out again, so none slips in.
 */
export async function setRecap(
  db: Database,
  studio: StudioRef,
  dyeAlongId: string,
  input: z.output<typeof recapUpdateSchema>,
): Promise<Recap> {
  const skeinIds = input.items.flatMap((i) => ('submissionId' in i ? [i.submissionId] : []));
  await db.transaction(async (tx) => {
    const eligible = skeinIds.length
      ? await tx
          .select({ id: submissions.id })
          .from(submissions)
          .where(and(recapEligible(dyeAlongId), inArray(submissions.id, skeinIds)))
          .for('share')
      : [];
    const okSkeins = new Set(eligible.map((s) => s.id));
    const okColorways = new Set((await monthColorways(db, studio, dyeAlongId)).map((c) => c.id));
    const fields: Record<string, string[]> = {};
    input.items.forEach((item, i) => {
      if ('submissionId' in item && !okSkeins.has(item.submissionId)) {
        fields[`items.${i}.submissionId`] = [
          'Only a featured skein whose maker agreed to be featured can enter the recap.',
        ];
      }
      if ('colorwayId' in item && !okColorways.has(item.colorwayId)) {
        fields[`items.${i}.colorwayId`] = ['Only the month’s own colorways can enter the recap.'];
      }
    });
    if (Object.keys(fields).length > 0) {
      throw new HttpError(400, 'VALIDATION_FAILED', 'Some items cannot be in this recap.', fields);
    }
    await tx.delete(recapItems).where(eq(recapItems.dyeAlongId, dyeAlongId));
    if (input.items.length > 0) {
      await tx.insert(recapItems).values(
        input.items.map((item, i) => ({
          dyeAlongId,
          position: i + 1,
          note: item.note,
          ...('submissionId' in item
            ? { submissionId: item.submissionId }
            : { colorwayId: item.colorwayId }),
        })),
      );
    }
  });
  return getRecap(db, studio, dyeAlongId);
}
