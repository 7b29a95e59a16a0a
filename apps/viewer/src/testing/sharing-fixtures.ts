import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import type { Submission } from '@vatside/contracts/submissions';
import { dyeAlongApi, dyeAlongId, publicPage } from './dye-along-fixtures.ts';
import { adaMe, kelpwhistle } from './fixtures.ts';

// The Kelpwhistle month with sharing open, and skeins shared to it in each review status.

export const sharePath = `/s/${kelpwhistle.slug}/dye-alongs/${dyeAlongId}/share`;
export const mySkeinsPath = `/s/${kelpwhistle.slug}/my-skeins`;
export const shareApi = `${dyeAlongApi}/submissions`;
export const mySkeinsApi = `/api/studios/${kelpwhistle.slug}/my-submissions`;

export const adaFollowing = {
  ...adaMe,
  memberships: [{ studio: kelpwhistle, role: 'viewer' as const, mailOptIn: false }],
};

const poolTeal = { colorwayId: 'c0ffee00-0000-4000-8000-000000000001', name: 'Pool Teal' };

/** Sharing opened an hour ago; the month has one colorway to name. */
export function openForSharing(): PublicDyeAlong {
  const page = publicPage();
  const [bath] = page.supplyList.colorways;
  return {
    ...page,
    status: 'sharing',
    shareOpensAt: new Date(Date.now() - 3_600_000).toISOString(),
    supplyList: {
      ...page.supplyList,
      colorways: [
        {
          ...(bath ?? {
            technique: 'immersion',
            skeins: 1,
            weightOfGoodsG: 100,
            bathVolumeMl: 3000,
            water: { label: '3 L', measuredMl: 3000, tooSmallToMeasure: false },
            lines: [],
            acid: {
              acid: 'vinegar',
              acidStrengthPct: 5,
              amountMl: 60,
              household: { label: '¼ cup', measuredMl: 59, tooSmallToMeasure: false },
              rule: '30 mL per 50 g (common practice).',
            },
            targetSwatches: [],
          }),
          ...poolTeal,
        },
      ],
    },
  };
}

const photo = (submissionId: string, photoId: string, position: number) => ({
  id: photoId,
  position,
  width: 800,
  height: 600,
  thumbWidth: 320,
  thumbHeight: 240,
  yarnCrop: { x: 0.2, y: 0.2, width: 0.6, height: 0.6 },
  webUrl: `/api/studios/${kelpwhistle.slug}/submissions/${submissionId}/photos/${photoId}/web`,
  thumbUrl: `/api/studios/${kelpwhistle.slug}/submissions/${submissionId}/photos/${photoId}/thumb`,
});

export function skein(changes: Partial<Submission> & Pick<Submission, 'id'>): Submission {
  return {
    dyeAlong: { id: dyeAlongId, title: 'Tide pool month' },
    colorway: { id: poolTeal.colorwayId, name: poolTeal.name },
    baseName: 'Shoreline Sock',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    dyesUsed: ['teal gel'],
    notes: '',
    consentToFeature: false,
    status: 'waiting',
    reason: null,
    closeness: { band: 'close', message: 'Close to the inspiration, with a touch of its own.' },
    yarnPalette: [
      {
        id: '5a7c0000-0000-4000-8000-000000000005',
        hex: '#2d6f86',
        lab: { l: 43, a: -12, b: -20 },
        share: 0.8,
        name: 'moderate greenish blue',
        label: '',
      },
    ],
    photos: [photo(changes.id, `${changes.id.slice(0, -1)}f`, 1)],
    waitingSince: '2026-12-14T10:00:00.000Z',
    createdAt: '2026-12-14T10:00:00.000Z',
    updatedAt: '2026-12-14T10:00:00.000Z',
    ...changes,
  };
}
