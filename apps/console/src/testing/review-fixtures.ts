import type {
  AuditEntry,
  BulkDecision,
  ReviewDecision,
  ReviewSubmission,
} from '@vatside/contracts/review';
import { http, HttpResponse } from 'msw';
import { dyeAlongId, draftDetail } from './dye-along-fixtures.ts';
import { kelpwhistleDetail, moderatorMe } from './fixtures.ts';
import { server, signIn } from './server.ts';
import { studioApi } from './workbench-fixtures.ts';

// Three invented sharers' skeins waiting in Kelpwhistle's queue, and a stand-in for the review
// routes that keeps its own statuses, so a decided skein leaves the queue as on the server.

const skeinIds = [
  '0b1c2d3e-4f5a-4b6c-8d7e-9f0a1b2c3d01',
  '0b1c2d3e-4f5a-4b6c-8d7e-9f0a1b2c3d02',
  '0b1c2d3e-4f5a-4b6c-8d7e-9f0a1b2c3d03',
] as const;

function skein(i: number, name: string, consentToFeature: boolean): ReviewSubmission {
  const id = skeinIds[i]!;
  const photo = `${studioApi}/submissions/${id}/photos/9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6${i}`;
  return {
    id,
    dyeAlong: { id: dyeAlongId, title: 'Tide pool month' },
    colorway: { id: '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d', name: 'Pool Teal' },
    baseName: 'Shoreline Sock',
    fiberContent: [
      { fiber: 'wool', pct: 75 },
      { fiber: 'nylon', pct: 25 },
    ],
    dyesUsed: ['Brinewell Blue', 'Table vinegar'],
    notes: `Skein ${i + 1}, dyed on the stove.`,
    consentToFeature,
    status: 'waiting',
    reason: null,
    closeness: { band: 'close', message: 'Close to the inspiration.' },
    yarnPalette: [],
    photos: [
      {
        id: `9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6${i}`,
        position: 1,
        width: 240,
        height: 160,
        thumbWidth: 240,
        thumbHeight: 160,
        yarnCrop: { x: 0, y: 0, width: 0.5, height: 1 },
        webUrl: `${photo}/web`,
        thumbUrl: `${photo}/thumb`,
      },
    ],
    waitingSince: `2026-12-0${i + 1}T10:00:00.000Z`,
    createdAt: `2026-12-0${i + 1}T10:00:00.000Z`,
    updatedAt: `2026-12-0${i + 1}T10:00:00.000Z`,
    sharer: { name },
  };
}

export const reviewPage = '/studios/kelpwhistle-dyeworks/review';

const to = {
  approve: 'approved',
  needsChanges: 'needsChanges',
  reject: 'rejected',
  feature: 'featured',
  unfeature: 'approved',
} as const;

/** A moderator of Kelpwhistle with three skeins waiting (only the second agreed to be featured). */
export function reviewQueueServer() {
  signIn(moderatorMe);
  const skeins = [
    skein(0, 'Wren Alder', false),
    skein(1, 'Juniper Sloe', true),
    skein(2, 'Corra Vane', false),
  ];
  const decisions: (ReviewDecision & { submissionId: string })[] = [];
  const bulks: BulkDecision[] = [];
  const refuse = new Map<string, string>();
  server.use(
    http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail('moderator'))),
    http.get(`${studioApi}/dye-alongs`, () =>
      HttpResponse.json({
        items: [draftDetail({ status: 'sharing' })],
        page: { limit: 100, offset: 0, total: 1 },
      }),
    ),
    http.get(`${studioApi}/review/submissions`, ({ request }) => {
      const url = new URL(request.url);
      const status = url.searchParams.get('status') ?? 'waiting';
      const limit = Number(url.searchParams.get('limit'));
      const items = skeins.filter((s) => s.status === status);
      return HttpResponse.json({
        items: items.slice(0, limit),
        page: { limit, offset: 0, total: items.length },
      });
    }),
    http.post(`${studioApi}/review/submissions/:id/decisions`, async ({ params, request }) => {
      const body = (await request.json()) as ReviewDecision;
      const id = String(params.id);
      decisions.push({ submissionId: id, ...body });
      const found = skeins.find((s) => s.id === id)!;
      const refusal = refuse.get(id);
      if (refusal) {
        return HttpResponse.json(
          { error: { code: 'CONFLICT', message: refusal } },
          { status: 409 },
        );
      }
      found.status = to[body.decision];
      return HttpResponse.json(found);
    }),
    http.post(`${studioApi}/review/decisions`, async ({ request }) => {
      const body = (await request.json()) as BulkDecision;
      bulks.push(body);
      return HttpResponse.json({
        results: body.submissionIds.map((id) => {
          const refusal = refuse.get(id);
          if (refusal)
            return { submissionId: id, ok: false, error: { code: 'CONFLICT', message: refusal } };
          const found = skeins.find((s) => s.id === id)!;
          found.status = to[body.decision];
          return { submissionId: id, ok: true, status: found.status };
        }),
      });
    }),
  );
  return { skeins, decisions, bulks, refuse };
}

export const auditEntries: AuditEntry[] = [
  {
    id: '5c6d7e8f-9a0b-4c1d-8e2f-3a4b5c6d7e01',
    submissionId: skeinIds[0],
    dyeAlongId,
    action: 'needsChanges',
    fromStatus: 'waiting',
    toStatus: 'needsChanges',
    reason: 'The photo is a little blurry. Please share a sharper one.',
    actor: { userId: 'u-oskar', name: 'Oskar Fenn' },
    skein: { makerName: 'Ada Wren', baseName: 'Harbor DK' },
    createdAt: '2026-12-04T15:30:00.000Z',
  },
  {
    id: '5c6d7e8f-9a0b-4c1d-8e2f-3a4b5c6d7e02',
    submissionId: skeinIds[1],
    dyeAlongId,
    action: 'approve',
    fromStatus: 'waiting',
    toStatus: 'approved',
    reason: null,
    actor: null,
    skein: null,
    createdAt: '2026-12-03T09:00:00.000Z',
  },
];
