import type { LivePot, LiveState } from '@vatside/contracts/live';
import type { LiveProgram } from '@vatside/contracts/live-program';

// An invented "tide pool" session: two pots, one with acid-dye stock, one with food color.
export const sessionId = '6d0f4c1e-2b3a-4c5d-8e9f-0a1b2c3d4e5f';

export const program: LiveProgram = {
  sessionId,
  mode: 'live',
  dyeAlong: {
    id: 'da-tide',
    title: 'Tide Pool Month',
    studioSlug: 'kelpwhistle-dyeworks',
    studioName: 'Kelpwhistle Dyeworks',
    streamUrl: 'https://stream.example.test/kelpwhistle/tide-pool',
  },
  pots: [
    {
      potId: 'pot-sea',
      colorwayName: 'Sea Glass',
      swatches: [
        { hex: '#7fb8a4', name: 'Frosted green' },
        { hex: '#cfe3dc', name: 'Pale sea' },
      ],
      recipe: {
        weightOfGoodsG: 100,
        liquorRatio: 30,
        acid: { acid: 'vinegar', acidStrengthPct: 5 },
        lines: [
          {
            id: '1a1a1a1a-0000-4000-8000-000000000001',
            kind: 'stock',
            stockSolutionId: null,
            dyeName: 'turquoise',
            stockStrengthPct: 1,
            depthOfShadePct: 2,
          },
        ],
      },
      steps: [
        {
          id: '2b2b2b2b-0000-4000-8000-000000000001',
          instruction: 'Soak the skein in warm water with a splash of vinegar',
          recipeLineId: null,
          timerSeconds: 1800,
          temperatureC: 40,
          visualCue: 'Warm to the touch, like a bath',
          caution: 'acid',
        },
        {
          id: '2b2b2b2b-0000-4000-8000-000000000002',
          instruction: 'Stir the turquoise stock into the pot',
          recipeLineId: '1a1a1a1a-0000-4000-8000-000000000001',
          timerSeconds: null,
          temperatureC: null,
          visualCue: null,
          caution: 'none',
        },
        {
          id: '2b2b2b2b-0000-4000-8000-000000000003',
          instruction: 'Lower the yarn in and hold just under a simmer',
          recipeLineId: null,
          timerSeconds: 1200,
          temperatureC: 85,
          visualCue: 'Steam rises and small bubbles cling to the edge; no rolling boil',
          caution: 'hotBath',
        },
      ],
    },
    {
      potId: 'pot-rock',
      colorwayName: 'Rock Pool',
      swatches: [],
      recipe: {
        weightOfGoodsG: 100,
        liquorRatio: 30,
        acid: { acid: 'vinegar', acidStrengthPct: 5 },
        lines: [
          {
            id: '1a1a1a1a-0000-4000-8000-000000000002',
            kind: 'foodColor',
            dyeId: null,
            colorName: 'sky blue',
            amountPer100g: 10,
            unit: 'drop',
          },
        ],
      },
      steps: [
        {
          id: '2b2b2b2b-0000-4000-8000-000000000004',
          instruction: 'Drip the sky blue over the crown of the skein',
          recipeLineId: '1a1a1a1a-0000-4000-8000-000000000002',
          timerSeconds: 600,
          temperatureC: null,
          visualCue: null,
          caution: 'none',
        },
        {
          id: '2b2b2b2b-0000-4000-8000-000000000005',
          instruction: 'Simmer until the water runs clear',
          recipeLineId: null,
          timerSeconds: 1800,
          temperatureC: 90,
          visualCue: 'Steady steam, a few lazy bubbles',
          caution: 'hotBath',
        },
      ],
    },
  ],
};

const stepTimers = (potIndex: number) =>
  program.pots[potIndex]!.steps.map((step) => step.timerSeconds ?? 0);

export function seaPot(changes: Partial<LivePot> = {}): LivePot {
  return {
    potId: 'pot-sea',
    colorwayName: 'Sea Glass',
    stepIndex: 1,
    stepCount: 3,
    stepTimersS: stepTimers(0),
    timer: { state: 'idle', durationMs: 0 },
    ...changes,
  };
}

export function rockPot(changes: Partial<LivePot> = {}): LivePot {
  return {
    potId: 'pot-rock',
    colorwayName: 'Rock Pool',
    stepIndex: 0,
    stepCount: 2,
    stepTimersS: stepTimers(1),
    timer: { state: 'idle', durationMs: 600_000 },
    ...changes,
  };
}

export function liveState(changes: Partial<LiveState> = {}): LiveState {
  return {
    sessionId,
    mode: 'live',
    status: 'running',
    streamDelayMs: 0,
    revision: 5,
    pots: [seaPot(), rockPot()],
    notes: [],
    ...changes,
  };
}
