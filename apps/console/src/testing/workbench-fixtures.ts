import type { Base } from '@vatside/contracts/workbench-bases';
import type {
  ColorwayDetail,
  ColorwaySummary,
  ComputedAmounts,
  Step,
} from '@vatside/contracts/workbench-colorways';
import { DYE_SAFETY_NOTE, type Page } from '@vatside/contracts/workbench-common';
import type { Image } from '@vatside/contracts/workbench-images';
import type { Dye, StockSolution } from '@vatside/contracts/workbench-shelf';
import { acidFor, scaleRecipe, type Recipe } from '@vatside/dye-kit';
import { http, HttpResponse } from 'msw';
import { kelpwhistleDetail } from './fixtures.ts';
import { server } from './server.ts';

// Invented workbench data for Kelpwhistle Dyeworks. Computed amounts come from dye-kit, as the
// server's do, so the screens are tested against realistic numbers.

export const studioApi = '/api/studios/kelpwhistle-dyeworks';
const stamps = { createdAt: '2025-04-01T10:00:00.000Z', updatedAt: '2025-04-01T10:00:00.000Z' };
const pageOf = <T>(items: T[]): { items: T[]; page: Page } => ({
  items,
  page: { limit: 100, offset: 0, total: items.length },
});

export const tealDye: Dye = {
  id: '0b7c2a44-1d5e-4f6a-8b9c-0d1e2f3a4b5c',
  kind: 'acidDyePowder',
  name: 'Rockpool teal',
  colorantIds: [],
  colorants: [],
  swatchHex: '#1f7a8c',
  ...stamps,
};

export const tealStock: StockSolution = {
  id: '5d6e7f80-9a1b-4c2d-8e3f-4a5b6c7d8e9f',
  dyeId: tealDye.id,
  dyeName: 'Rockpool teal',
  dyeKind: 'acidDyePowder',
  swatchHex: '#1f7a8c',
  stockStrengthPct: 1,
  volumeMadeMl: 500,
  madeOn: '2025-04-01',
  volumeLeftMl: 500,
  dyeLeftG: 5,
  ...stamps,
};

export const merinoBase: Base = {
  id: '7e8f9a0b-1c2d-4e3f-8a4b-5c6d7e8f9a0b',
  name: 'Harbor sock',
  fiberContent: [
    { fiber: 'wool', pct: 75 },
    { fiber: 'nylon', pct: 25 },
  ],
  superwash: true,
  weightClass: 1,
  skeinWeightG: 100,
  skeinLengthM: 400,
  lot: '',
  fiberCheck: { takesDyePct: 100, doesNotTakePct: 0, warnings: [] },
  ...stamps,
};

export const tidePool: ColorwaySummary = {
  id: '2c3d4e5f-6a7b-4c8d-9e0f-1a2b3c4d5e6f',
  name: 'Low tide',
  technique: 'immersion',
  baseId: merinoBase.id,
  potId: null,
  skeinCount: 1,
  weightOfGoodsG: 100,
  liquorRatio: 30,
  acid: { acid: 'vinegar', acidStrengthPct: 5 },
  recipeLines: [],
  targetSwatches: [],
  notes: '',
  ...stamps,
};

/** What the server answers for a colorway: dye-kit's amounts for its skeins. */
export function computedFor(colorway: ColorwaySummary, weightOfGoodsG?: number): ComputedAmounts {
  const recipe: Recipe = {
    weightOfGoodsG: colorway.weightOfGoodsG,
    liquorRatio: colorway.liquorRatio,
    acid: colorway.acid,
    lines: colorway.recipeLines.map((line) =>
      line.kind === 'stock'
        ? {
            kind: 'stock',
            dyeName: line.dyeName,
            stockStrengthPct: line.stockStrengthPct,
            depthOfShadePct: line.depthOfShadePct,
          }
        : {
            kind: 'foodColor',
            colorName: line.colorName,
            amountPer100g: line.amountPer100g,
            unit: line.unit,
          },
    ),
  };
  const amounts = scaleRecipe(
    recipe,
    weightOfGoodsG ? { weightOfGoodsG } : { skeins: colorway.skeinCount },
  );
  const acid = acidFor({
    weightOfGoodsG: amounts.weightOfGoodsG,
    bathVolumeMl: amounts.bathVolumeMl,
    acid: 'vinegar',
    acidStrengthPct: 5,
  });
  return { system: 'us', amounts, acid, warnings: amounts.warnings, safetyNote: DYE_SAFETY_NOTE };
}

export const detailOf = (colorway: ColorwaySummary): ColorwayDetail => ({
  ...colorway,
  computed: computedFor(colorway),
});

export const steps: Step[] = ['Soak the skein', 'Heat the bath', 'Add the dye'].map(
  (instruction, i) => ({
    id: `9a8b7c6d-5e4f-4a3b-8c2d-1e0f9a8b7c6${i}`,
    colorwayId: tidePool.id,
    position: i,
    instruction,
    recipeLineId: null,
    timerSeconds: i === 0 ? 1800 : null,
    temperatureC: i === 1 ? 85 : null,
    visualCue: i === 1 ? 'Steady steam, no rolling boil' : null,
    caution: i === 1 ? 'hotBath' : 'none',
    ...stamps,
  }),
);

export const rockpoolImage: Image = {
  id: '4f5e6d7c-8b9a-4a0b-9c1d-2e3f4a5b6c7d',
  purpose: 'inspiration',
  colorwayId: null,
  contentType: 'image/webp',
  width: 1200,
  height: 800,
  bytes: 84_000,
  thumbWidth: 320,
  thumbHeight: 213,
  palette: [
    {
      id: 'a1b2c3d4-e5f6-4a7b-8c9d-0e1f2a3b4c5d',
      hex: '#1f7a8c',
      lab: { l: 47, a: -20, b: -17 },
      share: 0.42,
      name: 'moderate greenish blue',
      label: '',
    },
    {
      id: 'b2c3d4e5-f6a7-4b8c-9d0e-1f2a3b4c5d6e',
      hex: '#d9c9a3',
      lab: { l: 81, a: 1, b: 19 },
      share: 0.33,
      name: 'grayish yellow',
      label: 'Sand',
    },
  ],
  webUrl: `${studioApi}/images/4f5e6d7c-8b9a-4a0b-9c1d-2e3f4a5b6c7d/web`,
  thumbUrl: `${studioApi}/images/4f5e6d7c-8b9a-4a0b-9c1d-2e3f4a5b6c7d/thumb`,
  ...stamps,
};

/** The studio as its host sees it, with these lists on the workbench. */
export function workbenchAsHost(
  lists: {
    bases?: Base[];
    stocks?: StockSolution[];
    dyes?: Dye[];
    colorways?: ColorwaySummary[];
    images?: Image[];
  } = {},
) {
  server.use(
    http.get(studioApi, () => HttpResponse.json(kelpwhistleDetail('host'))),
    http.get(`${studioApi}/bases`, () => HttpResponse.json(pageOf(lists.bases ?? []))),
    http.get(`${studioApi}/pots`, () => HttpResponse.json(pageOf([]))),
    http.get(`${studioApi}/dyes`, () => HttpResponse.json(pageOf(lists.dyes ?? []))),
    http.get(`${studioApi}/stock-solutions`, () => HttpResponse.json(pageOf(lists.stocks ?? []))),
    http.get(`${studioApi}/colorways`, () => HttpResponse.json(pageOf(lists.colorways ?? []))),
    http.get(`${studioApi}/images`, () => HttpResponse.json(pageOf(lists.images ?? []))),
  );
}
