import type {
  ColorwayBath,
  Household,
  PrepChecklist,
  SupplyList,
} from '@vatside/contracts/dye-along-supplies';
import type { DyeAlongDetail } from '@vatside/contracts/dye-alongs';
import { DYE_SAFETY_NOTE } from '@vatside/contracts/workbench-common';
import { toHouseholdMeasure, type MeasureSystem } from '@vatside/dye-kit';
import { http, HttpResponse } from 'msw';
import { server } from './server.ts';
import { studioApi } from './workbench-fixtures.ts';

// An invented month at Kelpwhistle Dyeworks: one colorway, "Pool Teal", 1 % depth of shade from
// a 1 % stock, so one skein of W grams takes W mL of stock (worked by hand) at a 30:1 bath.

export const dyeAlongId = '6a7b8c9d-0e1f-4a2b-8c3d-4e5f6a7b8c9d';
export const poolTealId = '1a2b3c4d-5e6f-4a7b-8c9d-0e1f2a3b4c5d';
export const dyeAlongApi = `${studioApi}/dye-alongs/${dyeAlongId}`;
const stamps = { createdAt: '2026-11-01T10:00:00.000Z', updatedAt: '2026-11-01T10:00:00.000Z' };

const household = (mL: number, system: MeasureSystem): Household => {
  const m = toHouseholdMeasure(mL, { system });
  return { label: m.label, measuredMl: m.measuredMl, tooSmallToMeasure: m.tooSmallToMeasure };
};

function bath(skeins: number, weightG: number, system: MeasureSystem): ColorwayBath {
  const acidMl = weightG * 0.6;
  return {
    colorwayId: poolTealId,
    name: 'Pool Teal',
    technique: 'immersion',
    skeins,
    weightOfGoodsG: weightG,
    bathVolumeMl: weightG * 30,
    water: household(weightG * 30, system),
    lines: [
      {
        name: 'Brinewell Blue',
        kind: 'stock',
        amount: weightG,
        unit: 'mL',
        household: household(weightG, system),
        approximate: false,
      },
    ],
    acid: {
      acid: 'vinegar',
      acidStrengthPct: 5,
      amountMl: acidMl,
      household: household(acidMl, system),
      rule: 'Pool Teal: 30 mL of 5 % vinegar per 50 g of fiber (common practice).',
    },
    targetSwatches: [
      { hex: '#1f6f78', name: 'Deep pool' },
      { hex: '#9fd3c7', name: 'Shallows' },
    ],
  };
}

/** What GET .../supply-list answers: `grams` null for the host's batch (2 × 100 g). */
export function suppliesFor(grams: number | null, system: MeasureSystem = 'us') {
  const b = grams === null ? bath(2, 200, system) : bath(1, grams, system);
  const supplyList: SupplyList = {
    scope: grams === null ? 'hostBatch' : 'perSkein',
    system,
    weightOfGoodsG: grams,
    dyes: [
      {
        key: 'stock:jar:1',
        kind: 'stock',
        name: 'Brinewell Blue',
        stockStrengthPct: 1,
        fromPowder: true,
        unit: 'mL',
        amount: b.weightOfGoodsG,
        volumeMl: b.weightOfGoodsG,
        dyeMassG: b.weightOfGoodsG / 100,
        household: household(b.weightOfGoodsG, system),
        approximate: false,
        mix: { volumeMl: 100, powderG: 1 },
        colorways: ['Pool Teal'],
      },
    ],
    acid: [
      {
        acid: 'vinegar',
        acidStrengthPct: 5,
        amountMl: b.acid.amountMl,
        household: b.acid.household,
        rules: [b.acid.rule],
        colorways: ['Pool Teal'],
      },
    ],
    yarn: [
      {
        baseId: null,
        name: 'Shoreline Sock',
        fiberContent: [
          { fiber: 'wool', pct: 75 },
          { fiber: 'nylon', pct: 25 },
        ],
        superwash: true,
        skeins: b.skeins,
        skeinWeightG: b.weightOfGoodsG / b.skeins,
        totalWeightG: b.weightOfGoodsG,
        colorways: ['Pool Teal'],
      },
    ],
    equipment: [{ key: 'gloves', item: 'Rubber gloves', detail: 'Dye stains skin.' }],
    colorways: [b],
    cautions: ['Hot dye baths and steam scald: lift yarn with tongs.'],
    warnings: [],
    safetyNote: DYE_SAFETY_NOTE,
  };
  const prepChecklist: PrepChecklist = {
    dayBefore: [
      {
        id: 'p1',
        text: 'Mix the Brinewell Blue stock.',
        when: 'dayBefore',
        source: 'runSheet',
        caution: 'powder',
      },
    ],
    hourBefore: [
      {
        id: 'p2',
        text: 'Soak the yarn.',
        when: 'hourBefore',
        source: 'commonPractice',
        caution: null,
      },
    ],
  };
  return { supplyList, prepChecklist };
}

export const draftDetail = (changes: Partial<DyeAlongDetail> = {}): DyeAlongDetail => ({
  id: dyeAlongId,
  studioId: '3f1c2a4e-8b7d-4c2a-9e1f-5a6b7c8d9e01',
  title: 'Tide pool month',
  description: '',
  status: 'draft',
  startsAt: '2026-12-12T18:00:00.000Z',
  timeZone: 'America/Halifax',
  startsAtHost: {
    timeZone: 'America/Halifax',
    local: '2026-12-12T14:00',
    label: 'Saturday, December 12, 2026 at 2:00 PM AST (America/Halifax)',
  },
  expectedLengthMin: 90,
  streamUrl: null,
  inspirationImageId: null,
  colorways: [{ id: poolTealId, name: 'Pool Teal', technique: 'immersion', position: 1 }],
  shareOpensAt: null,
  shareClosesAt: null,
  hostPrepItems: [],
  statusChangedAt: stamps.createdAt,
  announcedAt: null,
  nextStatuses: [{ to: 'announced', allowed: true, reasons: [] }],
  mail: { queued: 0, sent: 0, skipped: 0, failed: 0 },
  ...stamps,
  ...changes,
});

/** The supply-list route for every scope and weight, worked out as above. */
export function suppliesHandler() {
  server.use(
    http.get(`${dyeAlongApi}/supply-list`, ({ request }) => {
      const url = new URL(request.url);
      const system = url.searchParams.get('system') === 'metric' ? 'metric' : 'us';
      const grams =
        url.searchParams.get('scope') === 'hostBatch'
          ? null
          : Number(url.searchParams.get('weightOfGoodsG') ?? 100);
      return HttpResponse.json(suppliesFor(grams, system));
    }),
  );
}
