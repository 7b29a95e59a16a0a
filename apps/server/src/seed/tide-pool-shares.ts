import { and, eq, isNull } from '@vatside/db/sql';
import { reviewDecisionSchema, type ReasonTemplateId } from '@vatside/contracts/review';
import { submissionCreateSchema, type SubmissionStatus } from '@vatside/contracts/submissions';
import { demoPeople, tidePoolDyeAlong, tidePoolStudioSlug } from '@vatside/db/demo-data';
import {
  colorways,
  dyeAlongs,
  reviewMailOptOuts,
  reviewMailOutbox,
  studioMembers,
  studios,
  submissions,
  user,
} from '@vatside/db/schema';
import { decideOne } from '../services/review.ts';
import type { ShareLimits } from '../services/share-limits.ts';
import { sharingWindow } from '@vatside/contracts/sharing-window';
import { dyeAlongOpenForSharing, shareSkein } from '../services/submissions.ts';
import { skeinPhotoJpeg, yarnCropFor, type SkeinLook } from './tide-pool-share-photo.ts';
import type { TidePoolSeedDeps } from './tide-pool.ts';

// The tide pool month's shared skeins from the invented viewers, in every review state, each
// shared through the real sharing service (photos through the upload pipeline, closeness to the
// inspiration computed) and decided through the review service by a moderator.

type Outcome =
  | { to: 'waiting' }
  | { to: 'approved' }
  | { to: 'featured' }
  | { to: 'needsChanges'; reasonTemplate: ReasonTemplateId }
  | { to: 'rejected'; reason: string };

interface DemoShare {
  email: string;
  colorway: string | null;
  look: SkeinLook;
  baseName: string;
  fiberContent: { fiber: 'wool' | 'nylon' | 'silk' | 'alpaca'; pct: number }[];
  dyesUsed: string[];
  notes: string;
  consentToFeature: boolean;
  outcome: Outcome;
}

const sock = [
  { fiber: 'wool' as const, pct: 75 },
  { fiber: 'nylon' as const, pct: 25 },
];
const woolSilk = [
  { fiber: 'wool' as const, pct: 80 },
  { fiber: 'silk' as const, pct: 20 },
];

/** Invented sharers (demo-data's viewers) and skeins; some near the palette, some not at all. */
export const tidePoolShares: DemoShare[] = [
  {
    email: 'ada@viewers.example',
    colorway: 'Rockpool Teal',
    look: { yarn: ['#1b7f86', '#176c72', '#2f8f8a', '#3f7a4a'], surface: '#efe7d6' },
    baseName: 'Wrackline Sock',
    fiberContent: sock,
    dyesUsed: ['Brinewell Blue', 'Kelpstrand Green', 'Table vinegar'],
    notes: 'Held it at a simmer the full ten minutes; the water went clear.',
    consentToFeature: true,
    outcome: { to: 'featured' },
  },
  {
    email: 'bram@viewers.example',
    colorway: 'Coralline & Ochre',
    look: { yarn: ['#e07a93', '#c8922b', '#e6d6b0'], surface: '#dfe4e6' },
    baseName: 'Headland DK',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    dyesUsed: ['liquid food color — rose pink', 'gel food color — ochre'],
    notes: 'Poured the pink first, then the ochre at the other end.',
    consentToFeature: true,
    outcome: { to: 'approved' },
  },
  {
    email: 'cerys@viewers.example',
    colorway: 'Last Drop Tide Line',
    look: { yarn: ['#6b6a45', '#7d7350', '#5d6b4f'], surface: '#f3efe6' },
    baseName: 'Wrackline Sock',
    fiberContent: sock,
    dyesUsed: ['Leftover teal and ochre stocks'],
    notes: 'Every leftover jar went in. Came out a sea-glass olive.',
    consentToFeature: false,
    outcome: { to: 'approved' },
  },
  {
    email: 'dov@viewers.example',
    colorway: 'Rockpool Teal',
    look: { yarn: ['#1b7f86', '#2a6f78'], surface: '#d9cdb4', dim: true },
    baseName: 'Wrackline Sock',
    fiberContent: sock,
    dyesUsed: ['liquid food color — teal', 'Table vinegar'],
    notes: 'Took the photo at night under the kitchen light.',
    consentToFeature: true,
    outcome: { to: 'needsChanges', reasonTemplate: 'lighting' },
  },
  {
    email: 'esme@viewers.example',
    colorway: null,
    look: { yarn: ['#7a3f8f', '#b0487a', '#5b3a8c'], surface: '#f1ede4' },
    baseName: 'Merino silk fingering',
    fiberContent: woolSilk,
    dyesUsed: ['Grape drink mix', 'Citric acid'],
    notes: 'Went my own way with purples this month.',
    consentToFeature: true,
    outcome: { to: 'waiting' },
  },
  {
    email: 'fitz@viewers.example',
    colorway: 'Coralline & Ochre',
    look: { yarn: ['#d9728f', '#b5532b', '#c8922b'], surface: '#e9e3d3' },
    baseName: 'Wrackline Sock',
    fiberContent: sock,
    dyesUsed: ['Coralline Pink', 'Rustfall Orange'],
    notes: 'The rust broke a little toward brown; I like it.',
    consentToFeature: false,
    outcome: { to: 'waiting' },
  },
  {
    email: 'greta@viewers.example',
    colorway: 'Rockpool Teal',
    look: { yarn: ['#1f7a80', '#3f7a4a', '#9fd3c7'], surface: '#f6f1e7' },
    baseName: 'Wrackline Sock',
    fiberContent: sock,
    dyesUsed: ['Brinewell Blue', 'Kelpstrand Green'],
    notes: 'Second skein in the cooling bath came out paler.',
    consentToFeature: true,
    outcome: { to: 'waiting' },
  },
  {
    email: 'hamish@viewers.example',
    colorway: null,
    look: { yarn: ['#d21f2b', '#f2f2f2', '#1f3fbf'], surface: '#cfc6b2' },
    baseName: 'Shop skein',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    dyesUsed: [],
    notes: 'Not dyed by me, but it is pretty.',
    consentToFeature: false,
    outcome: {
      to: 'rejected',
      reason: 'This skein was not dyed in the dye-along, so it stays out of the gallery.',
    },
  },
  {
    email: 'ines@viewers.example',
    colorway: 'Coralline & Ochre',
    look: { yarn: ['#e07a93', '#e6d6b0', '#c8922b', '#e58aa0'], surface: '#dde3e4' },
    baseName: 'Headland DK',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    dyesUsed: ['Coralline Pink', 'gel food color — ochre', 'Table vinegar'],
    notes: 'Speckled the ochre on dry at the end.',
    consentToFeature: true,
    outcome: { to: 'featured' },
  },
  {
    email: 'jory@viewers.example',
    colorway: null,
    look: { yarn: ['#b8c23a', '#e0d04a', '#8aa832'], surface: '#efe9dc' },
    baseName: 'Wrackline Sock',
    fiberContent: sock,
    dyesUsed: ['Lemon-lime drink mix'],
    notes: 'Seaweed on the sand, sort of.',
    consentToFeature: false,
    outcome: { to: 'waiting' },
  },
  {
    email: 'kit@viewers.example',
    colorway: 'Rockpool Teal',
    look: { yarn: ['#1b7f86', '#3f7a4a'], surface: '#e8e1d0', farAway: true },
    baseName: 'Wrackline Sock',
    fiberContent: sock,
    dyesUsed: ['Brinewell Blue'],
    notes: 'Photo from across the room, sorry.',
    consentToFeature: true,
    outcome: { to: 'needsChanges', reasonTemplate: 'yarnHidden' },
  },
  {
    email: 'lowen@viewers.example',
    colorway: 'Last Drop Tide Line',
    look: { yarn: ['#4f7d74', '#8a7a4a', '#b07a7f'], surface: '#f4efe4' },
    baseName: 'Headland DK',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    dyesUsed: ['Leftover stocks'],
    notes: 'The tide line bled softly into the teal.',
    consentToFeature: true,
    outcome: { to: 'waiting' },
  },
];

/** The moderator's decisions that lead to each outcome (featuring comes after approving). */
function decisionsFor(outcome: Outcome) {
  switch (outcome.to) {
    case 'waiting':
      return [];
    case 'approved':
      return [{ decision: 'approve' as const }];
    case 'featured':
      return [{ decision: 'approve' as const }, { decision: 'feature' as const }];
    case 'needsChanges':
      return [{ decision: 'needsChanges' as const, reasonTemplate: outcome.reasonTemplate }];
    case 'rejected':
      return [{ decision: 'reject' as const, reason: outcome.reason }];
  }
}

/** The status each demo share ends in, for the seed's test. */
export const tidePoolShareStatuses: SubmissionStatus[] = tidePoolShares.map((s) => s.outcome.to);

/** Seeds the shares; a viewer who already shared a skein for the month is left as they are. */
// Each demo sharer shares one skein: the per-person limits never come into it.
const demoShareLimits: ShareLimits = { sharesPerHour: 1_000, storageQuotaBytes: 2 ** 40 };

export async function seedTidePoolShares(deps: TidePoolSeedDeps): Promise<void> {
  const { db } = deps;
  const now = deps.now ?? new Date();
  const [studio] = await db.select().from(studios).where(eq(studios.slug, tidePoolStudioSlug));
  if (!studio) throw new Error('The demo studio is missing; seed people first.');
  const [month] = await db
    .select()
    .from(dyeAlongs)
    .where(and(eq(dyeAlongs.studioId, studio.id), eq(dyeAlongs.title, tidePoolDyeAlong.title)));
  if (!month) throw new Error('The tide pool month is missing; seed it first.');
  // The studio's first moderator in the demo cast decides.
  const moderatorEmail = demoPeople.find((p) => p.roles[tidePoolStudioSlug] === 'moderator')?.email;
  const [moderator] = await db
    .select({ userId: studioMembers.userId })
    .from(studioMembers)
    .innerJoin(user, eq(user.id, studioMembers.userId))
    .where(
      and(
        eq(studioMembers.studioId, studio.id),
        eq(studioMembers.role, 'moderator'),
        eq(user.email, moderatorEmail ?? ''),
      ),
    );
  if (!moderator) throw new Error('The demo studio has no moderator.');

  // The demo month stays announced, so the live session can still be shown from the start. Its
  // sharing window is opened early instead (the host may open sharing before the live session,
  // see @vatside/contracts/sharing-window), so the shares below pass the real route's own check and a
  // demo viewer can share one more from the phone. It closes as planned, two weeks after the
  // start; shareClosesAt is left alone.
  if (!sharingWindow(month, now).open) {
    await db.update(dyeAlongs).set({ shareOpensAt: now }).where(eq(dyeAlongs.id, month.id));
  }

  const colorwayIds = new Map(
    (
      await db
        .select({ id: colorways.id, name: colorways.name })
        .from(colorways)
        .where(eq(colorways.studioId, studio.id))
    ).map((c) => [c.name, c.id]),
  );
  for (const plan of tidePoolShares) {
    const [sharer] = await db.select({ id: user.id }).from(user).where(eq(user.email, plan.email));
    if (!sharer) continue;
    const [already] = await db
      .select({ id: submissions.id })
      .from(submissions)
      .where(and(eq(submissions.dyeAlongId, month.id), eq(submissions.sharerUserId, sharer.id)));
    if (already) continue;

    // The decisions queue e-mails; the invented people are not mailed about them. Their own
    // opt-out holds the mails back while the seed decides (the mail job checks it just before
    // sending, should a server already run on this database); it is lifted again afterwards.
    const [held] = await db
      .insert(reviewMailOptOuts)
      .values({ studioId: studio.id, userId: sharer.id })
      .onConflictDoNothing()
      .returning({ userId: reviewMailOptOuts.userId });
    const dyeAlong = await dyeAlongOpenForSharing(db, studio.id, month.id, now);
    const shared = await shareSkein(db, deps.objectStore, {
      studio: { id: studio.id, slug: studio.slug },
      dyeAlong,
      sharerId: sharer.id,
      files: [await skeinPhotoJpeg(plan.look)],
      input: submissionCreateSchema.parse({
        colorwayId: plan.colorway ? (colorwayIds.get(plan.colorway) ?? null) : null,
        baseName: plan.baseName,
        fiberContent: plan.fiberContent,
        dyesUsed: plan.dyesUsed,
        notes: plan.notes,
        consentToFeature: plan.consentToFeature,
        crops: [yarnCropFor(plan.look)],
      }),
      maxPixels: deps.maxPixels,
      limits: demoShareLimits,
    });
    for (const decision of decisionsFor(plan.outcome)) {
      await decideOne(
        db,
        studio,
        moderator.userId,
        shared.id,
        reviewDecisionSchema.parse(decision),
      );
    }
    await db
      .update(reviewMailOutbox)
      .set({ skippedAt: now, skipReason: 'demoSeed' })
      .where(and(eq(reviewMailOutbox.submissionId, shared.id), isNull(reviewMailOutbox.skippedAt)));
    if (held) {
      await db
        .delete(reviewMailOptOuts)
        .where(
          and(eq(reviewMailOptOuts.studioId, studio.id), eq(reviewMailOptOuts.userId, sharer.id)),
        );
    }
  }
}
