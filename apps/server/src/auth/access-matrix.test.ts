import { randomUUID } from 'node:crypto';
import type { Router } from 'express';
import { io as connect } from 'socket.io-client';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiRouters } from '../app.ts';
import { clientEventNames } from '../realtime/socket-server.ts';
import type { RunningServer } from '../server.ts';
import { makeLiveSessions, type TestLive } from '../test-support/live-fixtures.ts';
import { castStudio, personaNames, type Cast, type PersonaName } from '../test-support/personas.ts';
import { startTestServer } from '../test-support/test-server.ts';

// 'allow' = the role check lets the request through (any status but 401/403, never 5xx);
// a number is the exact status the role check must answer.
type Expect = 'allow' | 401 | 403;
type Row = Record<PersonaName, Expect>;
const everyone: Row = {
  visitor: 'allow',
  viewer: 'allow',
  moderator: 'allow',
  host: 'allow',
  otherHost: 'allow',
};
const signedIn: Row = { ...everyone, visitor: 401 };
const staff: Row = { visitor: 401, viewer: 403, moderator: 'allow', host: 'allow', otherHost: 403 };
const hostOnly: Row = { ...staff, moderator: 403 };

interface RouteCase {
  expect: Row;
  path: (cast: Cast) => string;
  body?: (cast: Cast) => unknown;
}

const noUser = 'no-such-user';
const noToken = 'x'.repeat(43);

/** The workbench (issue 5): moderators read, the host edits; ids that name nothing still 404. */
function workbenchRoutes(): Record<string, RouteCase> {
  const at = (c: Cast, rest: string) => `/api/studios/${c.slug}${rest}`;
  const id = () => randomUUID();
  const read = (rest: () => string): RouteCase => ({ expect: staff, path: (c) => at(c, rest()) });
  const edit = (rest: () => string, body?: () => unknown): RouteCase => ({
    expect: hostOnly,
    path: (c) => at(c, rest()),
    ...(body ? { body } : {}),
  });
  const dye = () => ({ kind: 'acidDyePowder', name: 'Matrix Teal', swatchHex: '#1f6f78' });
  const base = () => ({
    name: 'Matrix Sock',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    superwash: true,
    weightClass: 1,
    skeinWeightG: 100,
    skeinLengthM: 400,
  });
  const pot = () => ({ name: 'Matrix pot', capacityMl: 8000, material: 'stainlessSteel' });
  const colorway = () => ({ name: 'Matrix Tide', technique: 'immersion', weightOfGoodsG: 100 });
  const step = () => ({ instruction: 'Stir gently.', caution: 'hotBath' });
  const routes: Record<string, RouteCase> = {
    'GET /api/studios/:slug/dyes': read(() => '/dyes'),
    'POST /api/studios/:slug/dyes': edit(() => '/dyes', dye),
    'GET /api/studios/:slug/dyes/:dyeId': read(() => `/dyes/${id()}`),
    'PATCH /api/studios/:slug/dyes/:dyeId': edit(
      () => `/dyes/${id()}`,
      () => ({ name: 'X' }),
    ),
    'DELETE /api/studios/:slug/dyes/:dyeId': edit(() => `/dyes/${id()}`),
    'GET /api/studios/:slug/stock-solutions': read(() => '/stock-solutions'),
    'POST /api/studios/:slug/stock-solutions': edit(
      () => '/stock-solutions',
      () => ({ dyeId: id(), stockStrengthPct: 1, volumeMadeMl: 500, madeOn: '2026-03-01' }),
    ),
    'GET /api/studios/:slug/stock-solutions/:stockId': read(() => `/stock-solutions/${id()}`),
    'PATCH /api/studios/:slug/stock-solutions/:stockId': edit(
      () => `/stock-solutions/${id()}`,
      () => ({ stockStrengthPct: 2 }),
    ),
    'DELETE /api/studios/:slug/stock-solutions/:stockId': edit(() => `/stock-solutions/${id()}`),
    'POST /api/studios/:slug/stock-solutions/:stockId/adjustments': edit(
      () => `/stock-solutions/${id()}/adjustments`,
      () => ({ volumeLeftMl: 100, reason: 'Measured the jar.' }),
    ),
    'GET /api/studios/:slug/bases': read(() => '/bases'),
    'POST /api/studios/:slug/bases': edit(() => '/bases', base),
    'GET /api/studios/:slug/bases/:baseId': read(() => `/bases/${id()}`),
    'PATCH /api/studios/:slug/bases/:baseId': edit(
      () => `/bases/${id()}`,
      () => ({ lot: 'M1' }),
    ),
    'DELETE /api/studios/:slug/bases/:baseId': edit(() => `/bases/${id()}`),
    'GET /api/studios/:slug/pots': read(() => '/pots'),
    'POST /api/studios/:slug/pots': edit(() => '/pots', pot),
    'GET /api/studios/:slug/pots/:potId': read(() => `/pots/${id()}`),
    'PATCH /api/studios/:slug/pots/:potId': edit(
      () => `/pots/${id()}`,
      () => ({ name: 'P' }),
    ),
    'DELETE /api/studios/:slug/pots/:potId': edit(() => `/pots/${id()}`),
    'GET /api/studios/:slug/colorways': read(() => '/colorways'),
    'POST /api/studios/:slug/colorways': edit(() => '/colorways', colorway),
    'GET /api/studios/:slug/colorways/:colorwayId': read(() => `/colorways/${id()}`),
    'PATCH /api/studios/:slug/colorways/:colorwayId': edit(
      () => `/colorways/${id()}`,
      () => ({ notes: 'Matrix' }),
    ),
    'DELETE /api/studios/:slug/colorways/:colorwayId': edit(() => `/colorways/${id()}`),
    'GET /api/studios/:slug/colorways/:colorwayId/amounts': read(
      () => `/colorways/${id()}/amounts?weightOfGoodsG=115`,
    ),
    'GET /api/studios/:slug/colorways/:colorwayId/steps': read(() => `/colorways/${id()}/steps`),
    'POST /api/studios/:slug/colorways/:colorwayId/steps': edit(
      () => `/colorways/${id()}/steps`,
      step,
    ),
    'PUT /api/studios/:slug/colorways/:colorwayId/steps/order': edit(
      () => `/colorways/${id()}/steps/order`,
      () => ({ stepIds: [id()] }),
    ),
    'PATCH /api/studios/:slug/colorways/:colorwayId/steps/:stepId': edit(
      () => `/colorways/${id()}/steps/${id()}`,
      () => ({ instruction: 'Rinse.' }),
    ),
    'DELETE /api/studios/:slug/colorways/:colorwayId/steps/:stepId': edit(
      () => `/colorways/${id()}/steps/${id()}`,
    ),
    'GET /api/studios/:slug/images': read(() => '/images'),
    // JSON instead of a photo: the host gets a 400, everyone else is refused before it is read.
    'POST /api/studios/:slug/images': edit(
      () => '/images',
      () => ({ purpose: 'inspiration' }),
    ),
    'GET /api/studios/:slug/images/:imageId': read(() => `/images/${id()}`),
    'DELETE /api/studios/:slug/images/:imageId': edit(() => `/images/${id()}`),
    'GET /api/studios/:slug/images/:imageId/web': read(() => `/images/${id()}/web`),
    'GET /api/studios/:slug/images/:imageId/thumb': read(() => `/images/${id()}/thumb`),
    'PUT /api/studios/:slug/images/:imageId/palette': edit(
      () => `/images/${id()}/palette`,
      () => ({ swatches: [] }),
    ),
    'POST /api/studios/:slug/images/:imageId/palette/pick': edit(
      () => `/images/${id()}/palette/pick`,
      () => ({ x: 0.5, y: 0.5 }),
    ),
  };
  return routes;
}

/**
 * Dye-alongs (issue 6): moderators read, the host plans and moves them on; the public page and
 * what hangs off it answer anyone (an id that names nothing is a 404 for everyone).
 */
function dyeAlongRoutes(): Record<string, RouteCase> {
  const at = (c: Cast, rest: string) => `/api/studios/${c.slug}/dye-alongs${rest}`;
  const one = () => `/${randomUUID()}`;
  const open = (rest: () => string): RouteCase => ({
    expect: everyone,
    path: (c) => at(c, rest()),
  });
  const edit = (rest: () => string, body?: () => unknown): RouteCase => ({
    expect: hostOnly,
    path: (c) => at(c, rest()),
    ...(body ? { body } : {}),
  });
  const inAMonth = () => new Date(Date.now() + 30 * 86_400_000).toISOString();
  const badToken = 'bm90LWEtdG9rZW4.bm90LWEtc2lnbmF0dXJl';
  return {
    'GET /api/studios/:slug/dye-alongs': open(() => '?month=2026-12'),
    'POST /api/studios/:slug/dye-alongs': edit(
      () => '',
      () => ({ title: 'Matrix tide', startsAt: inAMonth(), timeZone: 'America/Halifax' }),
    ),
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId': {
      expect: staff,
      path: (c) => at(c, one()),
    },
    'PATCH /api/studios/:slug/dye-alongs/:dyeAlongId': edit(one, () => ({ title: 'Matrix' })),
    'DELETE /api/studios/:slug/dye-alongs/:dyeAlongId': edit(one),
    'POST /api/studios/:slug/dye-alongs/:dyeAlongId/transitions': edit(
      () => `${one()}/transitions`,
      () => ({ to: 'announced' }),
    ),
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/public': open(() => `${one()}/public`),
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/supply-list': open(
      () => `${one()}/supply-list?weightOfGoodsG=50&system=us`,
    ),
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/calendar.ics': open(
      () => `${one()}/calendar.ics`,
    ),
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/inspiration/web': open(
      () => `${one()}/inspiration/web`,
    ),
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/inspiration/thumb': open(
      () => `${one()}/inspiration/thumb`,
    ),
    // No sign-in: the signed token is the permission (a forged one is a 400).
    'GET /api/mail/unsubscribe': {
      expect: everyone,
      path: () => `/api/mail/unsubscribe?token=${badToken}`,
    },
    'POST /api/mail/unsubscribe': {
      expect: everyone,
      path: () => `/api/mail/unsubscribe?token=${badToken}`,
    },
  };
}

let live: TestLive;

/** The live session (issue 7): the host starts one; anyone may find and read a public one. */
function liveRoutes(): Record<string, RouteCase> {
  return {
    'POST /api/studios/:slug/dye-alongs/:dyeAlongId/live-sessions': {
      expect: hostOnly,
      path: (c) => `/api/studios/${c.slug}/dye-alongs/${randomUUID()}/live-sessions`,
      body: () => ({ mode: 'rehearsal' }),
    },
    'GET /api/studios/:slug/live': { expect: everyone, path: (c) => `/api/studios/${c.slug}/live` },
    'GET /api/live-sessions/:sessionId/program': {
      expect: everyone,
      path: () => `/api/live-sessions/${live.liveSessionId}/program`,
    },
  };
}

/** The dye log and the questions (issue 8): helpers read the log; anyone reads the queue as their role may. */
function liveLogRoutes(): Record<string, RouteCase> {
  return {
    'GET /api/live-sessions/:sessionId/dye-log': {
      expect: staff,
      path: () => `/api/live-sessions/${live.liveSessionId}/dye-log`,
    },
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/dye-log': {
      expect: staff,
      path: (c) => `/api/studios/${c.slug}/dye-alongs/${live.dyeAlongId}/dye-log`,
    },
    'GET /api/live-sessions/:sessionId/questions': {
      expect: everyone,
      path: () => `/api/live-sessions/${live.liveSessionId}/questions?sort=meToo`,
    },
  };
}

/**
 * The archive (issue 11): helpers read bath records, the archive and dye again; only the host
 * writes a bath record (the matrix's month is live, so the host's write lands).
 */
function archiveRoutes(): Record<string, RouteCase> {
  const at = (c: Cast, rest: string) => `/api/studios/${c.slug}${rest}`;
  const records = (c: Cast) => at(c, `/dye-alongs/${live.dyeAlongId}/bath-records`);
  const read = (rest: () => string): RouteCase => ({ expect: staff, path: (c) => at(c, rest()) });
  return {
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/bath-records': {
      expect: staff,
      path: records,
    },
    'PUT /api/studios/:slug/dye-alongs/:dyeAlongId/bath-records/:colorwayId': {
      expect: hostOnly,
      path: (c) => `${records(c)}/${live.potId}`,
      body: () => ({ temperatureReachedC: 85, bathExhausted: true }),
    },
    'GET /api/studios/:slug/archive': read(() => '/archive?hex=%231f6f78'),
    'GET /api/studios/:slug/archive/:archivedColorwayId': read(() => `/archive/${randomUUID()}`),
    'GET /api/studios/:slug/archive/:archivedColorwayId/dye-again': read(
      () => `/archive/${randomUUID()}/dye-again?baseId=${randomUUID()}&skeins=2`,
    ),
  };
}

/**
 * Sharing, review, gallery and recap (issues 9 and 10): members share and manage only their own
 * skeins; helpers and the host review; visitors read the public gallery and approved photos.
 */
function sharingRoutes(): Record<string, RouteCase> {
  const at = (c: Cast, rest: string) => `/api/studios/${c.slug}${rest}`;
  const id = () => randomUUID();
  const sharers: Row = { ...everyone, visitor: 401, otherHost: 403 };
  const mine = (rest: () => string, body?: () => unknown): RouteCase => ({
    expect: sharers,
    path: (c) => at(c, `/my-submissions${rest()}`),
    ...(body ? { body } : {}),
  });
  const review = (rest: () => string, body?: () => unknown): RouteCase => ({
    expect: staff,
    path: (c) => at(c, `/review${rest()}`),
    ...(body ? { body } : {}),
  });
  const badToken = 'bm90LWEtdG9rZW4.bm90LWEtc2lnbmF0dXJl';
  return {
    // JSON instead of photos: sharers get a 404 (no such dye-along), others are refused first.
    'POST /api/studios/:slug/dye-alongs/:dyeAlongId/submissions': {
      expect: sharers,
      path: (c) => at(c, `/dye-alongs/${id()}/submissions`),
      body: () => ({ baseName: 'Matrix' }),
    },
    'GET /api/studios/:slug/my-submissions': mine(() => ''),
    'GET /api/studios/:slug/my-submissions/:submissionId': mine(() => `/${id()}`),
    'PATCH /api/studios/:slug/my-submissions/:submissionId': mine(
      () => `/${id()}`,
      () => ({ notes: 'Matrix' }),
    ),
    'DELETE /api/studios/:slug/my-submissions/:submissionId': mine(() => `/${id()}`),
    'PUT /api/studios/:slug/my-submissions/:submissionId/consent': mine(
      () => `/${id()}/consent`,
      () => ({ consentToFeature: false }),
    ),
    'GET /api/studios/:slug/submissions/:submissionId/photos/:photoId/web': {
      expect: everyone,
      path: (c) => at(c, `/submissions/${id()}/photos/${id()}/web`),
    },
    'GET /api/studios/:slug/submissions/:submissionId/photos/:photoId/thumb': {
      expect: everyone,
      path: (c) => at(c, `/submissions/${id()}/photos/${id()}/thumb`),
    },
    'GET /api/studios/:slug/review/submissions': review(() => '/submissions'),
    'GET /api/studios/:slug/review/submissions/:submissionId': review(() => `/submissions/${id()}`),
    'POST /api/studios/:slug/review/submissions/:submissionId/decisions': review(
      () => `/submissions/${id()}/decisions`,
      () => ({ decision: 'approve' }),
    ),
    'POST /api/studios/:slug/review/decisions': review(
      () => '/decisions',
      () => ({ submissionIds: [id()], decision: 'approve' }),
    ),
    'GET /api/studios/:slug/review/audit': review(() => '/audit'),
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/gallery': {
      expect: everyone,
      path: (c) => at(c, `/dye-alongs/${live.dyeAlongId}/gallery`),
    },
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/gallery/:submissionId': {
      expect: everyone,
      path: (c) => at(c, `/dye-alongs/${live.dyeAlongId}/gallery/${id()}`),
    },
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/colorways/:colorwayId/photos/:imageId/web': {
      expect: everyone,
      path: (c) => at(c, `/dye-alongs/${live.dyeAlongId}/colorways/${id()}/photos/${id()}/web`),
    },
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/colorways/:colorwayId/photos/:imageId/thumb': {
      expect: everyone,
      path: (c) => at(c, `/dye-alongs/${live.dyeAlongId}/colorways/${id()}/photos/${id()}/thumb`),
    },
    'GET /api/studios/:slug/dye-alongs/:dyeAlongId/recap': {
      expect: staff,
      path: (c) => at(c, `/dye-alongs/${live.dyeAlongId}/recap`),
    },
    'PUT /api/studios/:slug/dye-alongs/:dyeAlongId/recap': {
      expect: hostOnly,
      path: (c) => at(c, `/dye-alongs/${live.dyeAlongId}/recap`),
      body: () => ({ items: [] }),
    },
    // No sign-in: the signed token is the permission (a forged one is a 400).
    'GET /api/mail/review-unsubscribe': {
      expect: everyone,
      path: () => `/api/mail/review-unsubscribe?token=${badToken}`,
    },
    'POST /api/mail/review-unsubscribe': {
      expect: everyone,
      path: () => `/api/mail/review-unsubscribe?token=${badToken}`,
    },
    'GET /api/studios/:slug/storage': { expect: hostOnly, path: (c) => at(c, '/storage') },
  };
}

/** Every API route: a route missing here (or listed but gone) fails the first test. */
const routes: Record<string, RouteCase> = {
  // First: sharing needs the viewer still a member ('DELETE …/follow' below ends that).
  ...sharingRoutes(),
  'GET /api/health': { expect: everyone, path: () => '/api/health' },
  'GET /api/me': { expect: everyone, path: () => '/api/me' },
  'PATCH /api/me/profile': {
    expect: signedIn,
    path: () => '/api/me/profile',
    body: () => ({ unitSystem: 'metric' }),
  },
  'GET /api/studios': { expect: everyone, path: () => '/api/studios' },
  'POST /api/studios': {
    expect: signedIn,
    path: () => '/api/studios',
    body: () => ({
      name: 'Matrix Studio',
      slug: `matrix-${randomUUID().slice(0, 8)}`,
      accentHex: '#123456',
    }),
  },
  'GET /api/studios/:slug': { expect: everyone, path: (c) => `/api/studios/${c.slug}` },
  'PUT /api/studios/:slug/follow': {
    expect: signedIn,
    path: (c) => `/api/studios/${c.slug}/follow`,
    body: () => ({ mailOptIn: false }),
  },
  'DELETE /api/studios/:slug/follow': {
    expect: signedIn,
    path: (c) => `/api/studios/${c.slug}/follow`,
  },
  'GET /api/studios/:slug/members': {
    expect: staff,
    path: (c) => `/api/studios/${c.slug}/members`,
  },
  'PATCH /api/studios/:slug/members/:userId': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/members/${noUser}`,
    body: () => ({ role: 'viewer' }),
  },
  'DELETE /api/studios/:slug/members/:userId': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/members/${noUser}`,
  },
  'GET /api/studios/:slug/invitations': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/invitations`,
  },
  'POST /api/studios/:slug/invitations': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/invitations`,
    body: () => ({ email: `matrix-${randomUUID().slice(0, 6)}@example.test` }),
  },
  'DELETE /api/studios/:slug/invitations/:invitationId': {
    expect: hostOnly,
    path: (c) => `/api/studios/${c.slug}/invitations/${randomUUID()}`,
  },
  'GET /api/invitations/:token': { expect: everyone, path: () => `/api/invitations/${noToken}` },
  'POST /api/invitations/:token/accept': {
    expect: signedIn,
    path: () => `/api/invitations/${noToken}/accept`,
  },
  ...workbenchRoutes(),
  ...dyeAlongRoutes(),
  ...liveRoutes(),
  ...liveLogRoutes(),
  ...archiveRoutes(),
};

type SocketExpect = 'ok' | 'UNAUTHENTICATED' | 'FORBIDDEN' | 'NOT_FOUND';
const all = (e: SocketExpect): Record<PersonaName, SocketExpect> => ({
  visitor: e,
  viewer: e,
  moderator: e,
  host: e,
  otherHost: e,
});

/** Refusals for someone without a role here: a visitor, a viewer, another studio's host. */
const memberRefusals = {
  visitor: 'UNAUTHENTICATED',
  viewer: 'FORBIDDEN',
  otherHost: 'FORBIDDEN',
} as const;

interface SocketCase {
  event: (typeof clientEventNames)[number];
  label: string;
  expect: Record<PersonaName, SocketExpect>;
  payload: (c: Cast) => unknown;
}

/** Every client event, some in more than one situation (a public session, a rehearsal). */
const socketCases: SocketCase[] = [
  {
    event: 'clock:ping',
    label: 'clock:ping',
    expect: all('ok'),
    payload: () => ({ clientSentAtMs: Date.now() }),
  },
  {
    event: 'studio:watch',
    label: 'studio:watch',
    expect: all('ok'),
    payload: (c) => ({ slug: c.slug }),
  },
  {
    event: 'members:watch',
    label: 'members:watch',
    expect: {
      visitor: 'UNAUTHENTICATED',
      viewer: 'FORBIDDEN',
      moderator: 'ok',
      host: 'ok',
      otherHost: 'FORBIDDEN',
    },
    payload: (c) => ({ slug: c.slug }),
  },
  {
    event: 'live:join',
    label: 'live:join a live session',
    expect: all('ok'),
    payload: () => ({ sessionId: live.liveSessionId }),
  },
  {
    event: 'live:join',
    label: 'live:join a rehearsal',
    expect: { ...all('NOT_FOUND'), host: 'ok' },
    payload: () => ({ sessionId: live.rehearsalId }),
  },
  {
    event: 'live:action',
    label: 'live:action on a live session',
    expect: {
      visitor: 'UNAUTHENTICATED',
      viewer: 'FORBIDDEN',
      moderator: 'FORBIDDEN',
      host: 'ok',
      otherHost: 'FORBIDDEN',
    },
    payload: () => ({
      sessionId: live.liveSessionId,
      action: { type: 'note:push', text: 'Matrix note' },
    }),
  },
  {
    event: 'live:action',
    label: 'live:action on a rehearsal',
    expect: { ...all('NOT_FOUND'), host: 'ok' },
    payload: () => ({
      sessionId: live.rehearsalId,
      action: { type: 'note:push', text: 'Matrix note' },
    }),
  },
  {
    event: 'dyeLog:record',
    label: 'dyeLog:record on a live session',
    expect: { ...memberRefusals, moderator: 'FORBIDDEN', host: 'ok' },
    payload: () => ({
      sessionId: live.liveSessionId,
      potId: live.potId,
      recipeLineId: live.recipeLineId,
      amount: 5,
    }),
  },
  {
    event: 'dyeLog:record',
    label: 'dyeLog:record on a rehearsal',
    expect: { ...all('NOT_FOUND'), host: 'ok' },
    payload: () => ({
      sessionId: live.rehearsalId,
      potId: live.potId,
      recipeLineId: live.recipeLineId,
    }),
  },
  {
    // An entry that names nothing: the role check answers first, the host then gets a 404.
    event: 'dyeLog:correct',
    label: 'dyeLog:correct',
    expect: { ...memberRefusals, moderator: 'FORBIDDEN', host: 'NOT_FOUND' },
    payload: () => ({
      sessionId: live.liveSessionId,
      entryId: randomUUID(),
      amount: 1,
      reason: 'Matrix',
    }),
  },
  {
    event: 'questions:join',
    label: 'questions:join a live session',
    expect: all('ok'),
    payload: () => ({ sessionId: live.liveSessionId }),
  },
  {
    event: 'questions:join',
    label: 'questions:join a rehearsal',
    expect: { ...all('NOT_FOUND'), host: 'ok' },
    payload: () => ({ sessionId: live.rehearsalId }),
  },
  {
    event: 'questions:ask',
    label: 'questions:ask',
    expect: { ...all('ok'), visitor: 'UNAUTHENTICATED' },
    payload: () => ({ sessionId: live.liveSessionId, text: 'Matrix question?' }),
  },
  {
    event: 'questions:ask',
    label: 'questions:ask in a rehearsal',
    expect: { ...all('NOT_FOUND'), host: 'ok' },
    payload: () => ({ sessionId: live.rehearsalId, text: 'Practice question?' }),
  },
  {
    event: 'questions:meToo',
    label: 'questions:meToo',
    expect: { ...all('NOT_FOUND'), visitor: 'UNAUTHENTICATED' },
    payload: () => ({ sessionId: live.liveSessionId, questionId: randomUUID() }),
  },
  ...(['questions:answer', 'questions:hide', 'questions:mute'] as const).map(
    (event): SocketCase => ({
      // A question that names nothing: helpers and the host pass the role check, then get a 404.
      event,
      label: event,
      expect: { ...memberRefusals, moderator: 'NOT_FOUND', host: 'NOT_FOUND' },
      payload: () => ({
        sessionId: live.liveSessionId,
        questionId: randomUUID(),
        answer: 'Matrix',
        hidden: true,
        muted: true,
      }),
    }),
  ),
  {
    event: 'live:leave',
    label: 'live:leave',
    expect: all('ok'),
    payload: () => ({ sessionId: live.liveSessionId }),
  },
];

interface RouteLayer {
  route?: { path: string; methods: Record<string, boolean> };
}

describe('access matrix: every route and socket event against every role', () => {
  let server: RunningServer;
  let cast: Cast;

  beforeAll(async () => {
    server = await startTestServer();
    cast = await castStudio(server, 'matrix');
    live = await makeLiveSessions(cast.clients.host, cast.slug);
  });
  afterAll(() => server.close());

  it('lists exactly the routes the server really has', () => {
    const real = apiRouters.flatMap((make) =>
      ((make(server.deps) as Router).stack as RouteLayer[]).flatMap((layer) =>
        layer.route
          ? Object.keys(layer.route.methods).map(
              (m) => `${m.toUpperCase()} /api${layer.route?.path}`,
            )
          : [],
      ),
    );
    expect(real.sort()).toEqual(Object.keys(routes).sort());
  });

  for (const persona of personaNames) {
    it(`routes as ${persona}`, async () => {
      const client = cast.clients[persona];
      const wrong: string[] = [];
      for (const [key, route] of Object.entries(routes)) {
        const method = key.split(' ')[0] ?? 'GET';
        const res = await client.request(method, route.path(cast), route.body?.(cast));
        const expected = route.expect[persona];
        const ok =
          expected === 'allow'
            ? ![401, 403].includes(res.status) && res.status < 500
            : res.status === expected;
        if (!ok) wrong.push(`${key}: expected ${expected}, got ${res.status}`);
      }
      expect(wrong).toEqual([]);
    });

    it(`socket events as ${persona}`, async () => {
      const cookie = (cast.clients[persona] as unknown as { cookies: Map<string, string> }).cookies;
      const socket = connect(server.url, {
        transports: ['websocket'],
        extraHeaders: { cookie: [...cookie].map(([k, v]) => `${k}=${v}`).join('; ') },
      });
      const wrong: string[] = [];
      try {
        for (const spec of socketCases) {
          const reply = (await socket
            .timeout(5000)
            .emitWithAck(spec.event as 'studio:watch', spec.payload(cast) as { slug: string })) as {
            error?: { code: string };
          };
          const got = reply.error?.code ?? 'ok';
          if (got !== spec.expect[persona])
            wrong.push(`${spec.label}: expected ${spec.expect[persona]}, got ${got}`);
        }
      } finally {
        socket.disconnect();
      }
      expect(wrong).toEqual([]);
    });
  }

  it('lists exactly the socket events the server handles', () => {
    expect([...clientEventNames].sort()).toEqual(
      [...new Set(socketCases.map((c) => c.event))].sort(),
    );
  });
});
