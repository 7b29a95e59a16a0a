import { and, asc, desc, eq, inArray, notInArray, sql } from '@vatside/db/sql';
import type {
  Gallery,
  Recap,
  RecapItem,
  galleryQuerySchema,
  recapUpdateSchema,
} from '@vatside/contracts/gallery';
import type { Database } from '@vatside/db/client';
import { colorways, dyeAlongColorways, recapItems, submissions } from '@vatside/db/schema';
import type { z } from 'zod';
import { HttpError } from '../http/errors.ts';
import { loadSubmissions, toGallerySkein } from './submission-view.ts';
import type { StudioRef } from './submissions.ts';
import { pageInfo } from './workbench-common.ts';

// The month's public gallery and the host's recap running order. The gallery's one rule: only
// approved and featured skeins, whoever asks. The recap's: only featured skeins whose makers
// said yes, and the month's own colorways.

const PUBLIC_STATUSES = ['approved', 'featured'] as const;

async function monthColorways(db: Database, dyeAlongId: string) {
  return db
    .select({ id: colorways.id, name: colorways.name, technique: colorways.technique })
    .from(dyeAlongColorways)
    .innerJoin(colorways, eq(colorways.id, dyeAlongColorways.colorwayId))
    .where(eq(dyeAlongColorways.dyeAlongId, dyeAlongId))
    .orderBy(asc(dyeAlongColorways.position));
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
    colorways: await monthColorways(db, dyeAlongId),
  };
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
    monthColorways(db, dyeAlongId),
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
    const okColorways = new Set((await monthColorways(db, dyeAlongId)).map((c) => c.id));
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
