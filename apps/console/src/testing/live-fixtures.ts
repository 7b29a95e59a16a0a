import {
  applyHostAction,
  LiveActionError,
  type HostAction,
  type LiveState,
} from '@vatside/contracts/live';
import type { SessionDyeLog } from '@vatside/contracts/dye-log';
import type { LiveProgram } from '@vatside/contracts/live-program';
import type { QuestionQueue } from '@vatside/contracts/questions';
import { idleTimer } from '@vatside/contracts/pot-timer';
import { http, HttpResponse } from 'msw';
import { hostMe, kelpwhistle, kelpwhistleDetail } from './fixtures.ts';
import { FakeLiveSocket } from './fake-live-socket.ts';
import { server, signIn } from './server.ts';

// An invented two-pot session of Kelpwhistle Dyeworks for the pot board's tests.

export const sessionId = '6a1e2b3c-4d5e-4f60-8a7b-9c0d1e2f3a4b';
const lowTideId = '2c3d4e5f-6a7b-4c8d-9e0f-1a2b3c4d5e6f';
const kelpShadeId = '8d9e0f1a-2b3c-4d5e-8f6a-7b8c9d0e1f2a';
export const tealLineId = 'c0ffee00-0000-4000-8000-000000000001';

const step = (
  id: string,
  instruction: string,
  more: Partial<LiveProgram['pots'][number]['steps'][number]> = {},
) => ({
  id,
  instruction,
  recipeLineId: null,
  timerSeconds: null,
  temperatureC: null,
  visualCue: null,
  caution: 'none' as const,
  ...more,
});

export const program: LiveProgram = {
  sessionId,
  mode: 'live',
  dyeAlong: {
    id: '0f1e2d3c-4b5a-4968-8776-655443322110',
    title: 'Tide pool month',
    studioSlug: kelpwhistle.slug,
    studioName: kelpwhistle.name,
    streamUrl: null,
  },
  pots: [
    {
      potId: lowTideId,
      colorwayName: 'Low tide',
      swatches: [{ hex: '#4f7f8c', name: 'Slate teal' }],
      recipe: {
        weightOfGoodsG: 100,
        liquorRatio: 30,
        acid: { acid: 'vinegar', acidStrengthPct: 5 },
        lines: [
          {
            id: tealLineId,
            kind: 'stock',
            stockSolutionId: null,
            dyeName: 'Rockpool teal',
            stockStrengthPct: 1,
            depthOfShadePct: 0.5,
          },
        ],
      },
      steps: [
        step('a1000000-0000-4000-8000-000000000001', 'Presoak the yarn in lukewarm water.', {
          timerSeconds: 1800,
        }),
        step('a1000000-0000-4000-8000-000000000002', 'Heat the bath to a simmer.', {
          temperatureC: 85,
          visualCue: 'Small bubbles on the bottom, steam rising, never a rolling boil.',
          caution: 'hotBath',
        }),
        step('a1000000-0000-4000-8000-000000000003', 'Pour in the teal stock.', {
          recipeLineId: tealLineId,
          timerSeconds: 600,
          caution: 'hotBath',
        }),
      ],
    },
    {
      potId: kelpShadeId,
      colorwayName: 'Kelp shade',
      swatches: [],
      recipe: {
        weightOfGoodsG: 100,
        liquorRatio: 30,
        acid: { acid: 'citric' },
        lines: [],
      },
      steps: [
        step('b1000000-0000-4000-8000-000000000001', 'Add the citric acid and stir.', {
          caution: 'acid',
        }),
        step('b1000000-0000-4000-8000-000000000002', 'Hold at a simmer.', { timerSeconds: 300 }),
      ],
    },
  ],
};

const emptyQueue: QuestionQueue = {
  sessionId,
  view: 'staff',
  questions: [],
  mine: [],
  meToos: [],
  muted: false,
  limits: { minIntervalS: 30, perSession: 5, asked: 0 },
};

/** The dye log before anything is logged: Low tide's teal line, 50 mL planned; no jar. */
export const emptyDyeLog: SessionDyeLog = {
  sessionId,
  mode: 'live',
  pots: [
    {
      potId: lowTideId,
      colorwayName: 'Low tide',
      weightOfGoodsG: 100,
      skeinCount: 1,
      lines: [
        {
          recipeLineId: tealLineId,
          kind: 'stock',
          name: 'Rockpool teal',
          unit: 'mL',
          plannedAmount: 50,
          loggedAmount: 0,
          differencePct: null,
          stockSolutionId: null,
          jarVolumeLeftMl: null,
        },
      ],
    },
    {
      potId: kelpShadeId,
      colorwayName: 'Kelp shade',
      weightOfGoodsG: 100,
      skeinCount: 1,
      lines: [],
    },
  ],
  entries: [],
};

/** Every pot on its first step, as the server starts a session. */
export function initialState(mode: LiveState['mode'] = 'live'): LiveState {
  return {
    sessionId,
    mode,
    status: 'running',
    streamDelayMs: 0,
    revision: 0,
    notes: [],
    pots: program.pots.map((pot) => {
      const stepTimersS = pot.steps.map((s) => s.timerSeconds ?? 0);
      return {
        potId: pot.potId,
        colorwayName: pot.colorwayName,
        stepIndex: 0,
        stepCount: pot.steps.length,
        stepTimersS,
        timer: idleTimer((stepTimersS[0] ?? 0) * 1000),
      };
    }),
  };
}

/**
 * A fake server behind the fake socket: it runs the same `applyHostAction` as the real one,
 * refuses the way it does, and keeps a clock `serverAheadMs` ahead of this machine's.
 */
export function fakeLiveServer(start: LiveState, { serverAheadMs = 0 } = {}) {
  let state = start;
  let noteCount = 0;
  const socket = new FakeLiveSocket({
    'live:join': () => ({ state, serverNowMs: Date.now() + serverAheadMs, view: 'host' }),
    'clock:ping': ({ clientSentAtMs }: { clientSentAtMs: number }) => ({
      clientSentAtMs,
      serverAtMs: Date.now() + serverAheadMs,
    }),
    'questions:join': () => emptyQueue,
    'live:action': ({ action }: { action: HostAction }) => {
      try {
        state = applyHostAction(
          state,
          action,
          Date.now() + serverAheadMs,
          () => `note-${++noteCount}`,
        );
        return { state };
      } catch (error) {
        if (!(error instanceof LiveActionError)) throw error;
        return { error: { code: 'CONFLICT', message: error.message } };
      }
    },
  });
  return {
    socket,
    get state() {
      return state;
    },
    /** Changes the server's state without a push, as if actions happened while a phone was away. */
    set state(next: LiveState) {
      state = next;
    },
  };
}

/** The host of Kelpwhistle signed in, with the session's run sheets on the API. */
export function boardAsHost() {
  signIn(hostMe);
  server.use(
    http.get(`/api/studios/${kelpwhistle.slug}`, () =>
      HttpResponse.json(kelpwhistleDetail('host')),
    ),
    http.get(`/api/live-sessions/${sessionId}/program`, () => HttpResponse.json(program)),
    http.get(`/api/live-sessions/${sessionId}/dye-log`, () => HttpResponse.json(emptyDyeLog)),
  );
}

export const boardPath = `/studios/${kelpwhistle.slug}/live/${sessionId}`;
