import type { Household, SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import { DYE_SAFETY_NOTE } from '@vatside/contracts/workbench-common';
import { toHouseholdMeasure, type MeasureSystem } from '@vatside/dye-kit';
import { kelpwhistle } from './fixtures.ts';

// An invented month at Kelpwhistle Dyeworks: "Pool Teal", 1 % depth of shade from a 1 % stock,
// so a skein of W grams takes W mL of stock (worked by hand), at a 30:1 bath.

export const dyeAlongId = '6a7b8c9d-0e1f-4a2b-8c3d-4e5f6a7b8c9d';
export const dyeAlongApi = `/api/studios/${kelpwhistle.slug}/dye-alongs/${dyeAlongId}`;
export const dyeAlongPath = `/s/${kelpwhistle.slug}/dye-alongs/${dyeAlongId}`;

const household = (mL: number, system: MeasureSystem): Household => {
  const m = toHouseholdMeasure(mL, { system });
  return { label: m.label, measuredMl: m.measuredMl, tooSmallToMeasure: m.tooSmallToMeasure };
};

function supplies(grams: number, system: MeasureSystem): SupplyList {
  const acidMl = grams * 0.6;
  return {
    scope: 'perSkein',
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
        amount: grams,
        volumeMl: grams,
        dyeMassG: grams / 100,
        household: household(grams, system),
        approximate: false,
        mix: { volumeMl: 100, powderG: 1 },
        colorways: ['Pool Teal'],
      },
    ],
    acid: [
      {
        acid: 'vinegar',
        acidStrengthPct: 5,
        amountMl: acidMl,
        household: household(acidMl, system),
        rules: ['Pool Teal: 30 mL of 5 % vinegar per 50 g of fiber (common practice).'],
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
        skeins: 1,
        skeinWeightG: grams,
        totalWeightG: grams,
        colorways: ['Pool Teal'],
      },
    ],
    equipment: [{ key: 'gloves', item: 'Rubber gloves', detail: 'Dye stains skin.' }],
    colorways: [],
    cautions: ['Hot dye baths and steam scald: lift yarn with tongs.'],
    warnings: [],
    safetyNote: DYE_SAFETY_NOTE,
  };
}

/** The public page as the server would answer for this skein and these measures. */
export function publicPage(grams = 100, system: MeasureSystem = 'us'): PublicDyeAlong {
  return {
    id: dyeAlongId,
    studio: { slug: kelpwhistle.slug, name: kelpwhistle.name },
    title: 'Tide pool month',
    description: 'Three pools, one pot each.',
    status: 'announced',
    // 2 PM in Halifax (AST, UTC−4) on December 12.
    startsAt: '2026-12-12T18:00:00.000Z',
    endsAt: '2026-12-12T19:30:00.000Z',
    hostTimeZone: 'America/Halifax',
    startsAtHost: {
      timeZone: 'America/Halifax',
      local: '2026-12-12T14:00',
      label: 'Saturday, December 12, 2026 at 2:00 PM AST (America/Halifax)',
    },
    startsAtLocal: {
      timeZone: 'America/Halifax',
      local: '2026-12-12T14:00',
      label: 'Saturday, December 12, 2026 at 2:00 PM AST (America/Halifax)',
    },
    expectedLengthMin: 90,
    streamUrl: 'https://stream.example.test/kelpwhistle',
    inspiration: null,
    shareOpensAt: null,
    shareClosesAt: null,
    supplyList: supplies(grams, system),
    prepChecklist: {
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
    },
    cautions: ['Hot dye baths and steam scald: lift yarn with tongs.'],
    calendarUrl: `${dyeAlongApi}/calendar.ics`,
  };
}
