/** The invented demo studios and people. Every name here is made up. */
export const demoStudios = [
  {
    slug: 'wrackline-dyehouse',
    name: 'Wrackline Dyehouse',
    tagline: 'Small-batch yarn dyed on a windy coast. Tide-pool colors every month.',
    accentHex: '#1f6f78',
  },
  {
    slug: 'emberkettle-yarns',
    name: 'Emberkettle Yarns',
    tagline: 'Speckles, gradients and the odd leftover skein.',
    accentHex: '#b5532b',
  },
] as const;

/** Every demo person signs in with this password (printed by `npm start`). */
export const demoPassword = 'tidepool-demo-2026';

type DemoRole = 'host' | 'moderator' | 'viewer';
export interface DemoPerson {
  name: string;
  email: string;
  timeZone: string;
  unitSystem: 'us' | 'metric';
  defaultSkeinWeightG: number;
  roles: Partial<Record<(typeof demoStudios)[number]['slug'], DemoRole>>;
}

const viewer = (
  name: string,
  email: string,
  timeZone: string,
  unitSystem: 'us' | 'metric',
  grams: number,
): DemoPerson => ({
  name,
  email,
  timeZone,
  unitSystem,
  defaultSkeinWeightG: grams,
  roles: { 'wrackline-dyehouse': 'viewer' },
});

export const demoPeople: DemoPerson[] = [
  {
    name: 'Isla Marrowby',
    email: 'host@wrackline.example',
    timeZone: 'America/Halifax',
    unitSystem: 'us',
    defaultSkeinWeightG: 100,
    roles: { 'wrackline-dyehouse': 'host' },
  },
  {
    name: 'Tobin Ashgrove',
    email: 'moderator@wrackline.example',
    timeZone: 'America/Chicago',
    unitSystem: 'us',
    defaultSkeinWeightG: 100,
    roles: { 'wrackline-dyehouse': 'moderator' },
  },
  {
    name: 'Perpetua Lind',
    email: 'moderator2@wrackline.example',
    timeZone: 'Europe/Berlin',
    unitSystem: 'metric',
    defaultSkeinWeightG: 100,
    roles: { 'wrackline-dyehouse': 'moderator', 'emberkettle-yarns': 'viewer' },
  },
  {
    name: 'Oren Kettleby',
    email: 'host@emberkettle.example',
    timeZone: 'America/Denver',
    unitSystem: 'us',
    defaultSkeinWeightG: 115,
    roles: { 'emberkettle-yarns': 'host', 'wrackline-dyehouse': 'viewer' },
  },
  viewer('Ada Fenwick', 'ada@viewers.example', 'America/New_York', 'us', 100),
  viewer('Bram Quillon', 'bram@viewers.example', 'Europe/London', 'metric', 50),
  viewer('Cerys Oakhart', 'cerys@viewers.example', 'Europe/Dublin', 'metric', 100),
  viewer('Dov Pellam', 'dov@viewers.example', 'America/Los_Angeles', 'us', 115),
  viewer('Esme Rowntree', 'esme@viewers.example', 'Australia/Sydney', 'metric', 100),
  viewer('Fitz Harrowgate', 'fitz@viewers.example', 'America/Toronto', 'us', 50),
  viewer('Greta Vollmer', 'greta@viewers.example', 'Europe/Vienna', 'metric', 100),
  viewer('Hamish Dunlow', 'hamish@viewers.example', 'Pacific/Auckland', 'metric', 100),
  viewer('Ines Caraway', 'ines@viewers.example', 'Europe/Madrid', 'metric', 50),
  viewer('Jory Penhale', 'jory@viewers.example', 'America/Phoenix', 'us', 100),
  viewer('Kit Maresby', 'kit@viewers.example', 'America/Anchorage', 'us', 100),
  viewer('Lowen Tresize', 'lowen@viewers.example', 'Asia/Tokyo', 'metric', 100),
];

// ——— The invented "tide pool" month of Wrackline Dyehouse (issue 6) ———
// Generic food colors and invented acid-dye names; no real product or brand.

export const tidePoolStudioSlug = 'wrackline-dyehouse';

export const tidePoolDyes = [
  {
    kind: 'liquidFoodColor',
    name: 'liquid food color — teal',
    colorantIds: ['blue1', 'yellow5'],
    swatchHex: '#138a8a',
  },
  {
    kind: 'liquidFoodColor',
    name: 'liquid food color — rose pink',
    colorantIds: ['red40'],
    swatchHex: '#e0607e',
  },
  {
    kind: 'gelFoodColor',
    name: 'gel food color — ochre',
    colorantIds: ['yellow5', 'yellow6', 'red40'],
    swatchHex: '#c8922b',
  },
  {
    kind: 'gelFoodColor',
    name: 'gel food color — sea green',
    colorantIds: ['blue1', 'yellow5'],
    swatchHex: '#3f8f6a',
  },
  { kind: 'acidDyePowder', name: 'Brinewell Blue', colorantIds: [], swatchHex: '#1f6f8b' },
  { kind: 'acidDyePowder', name: 'Kelpstrand Green', colorantIds: [], swatchHex: '#4a7a3a' },
  { kind: 'acidDyePowder', name: 'Rustfall Orange', colorantIds: [], swatchHex: '#b5532b' },
  { kind: 'acidDyePowder', name: 'Coralline Pink', colorantIds: [], swatchHex: '#d9728f' },
] as const;

/** Every acid-dye powder is mixed into a 1 % (w/v) stock: 1 g of powder per 100 mL. */
export const tidePoolStockStrengthPct = 1;
export const tidePoolStockVolumeMl = 500;

export const tidePoolBases = [
  {
    name: 'Wrackline Sock',
    fiberContent: [
      { fiber: 'wool', pct: 75 },
      { fiber: 'nylon', pct: 25 },
    ],
    superwash: true,
    weightClass: 1,
    skeinWeightG: 100,
    skeinLengthM: 400,
    lot: 'WS-2611',
  },
  {
    name: 'Headland DK',
    fiberContent: [{ fiber: 'wool', pct: 100 }],
    superwash: false,
    weightClass: 3,
    skeinWeightG: 100,
    skeinLengthM: 210,
    lot: 'HD-2611',
  },
] as const;

export const tidePoolPots = [
  { name: 'Big stainless stockpot', capacityMl: 12_000, material: 'stainlessSteel' },
  { name: 'Blue enamel pot', capacityMl: 6_000, material: 'enamel' },
] as const;

/** Names for the inspiration palette's swatches: the nearest swatch to each hex gets the name. */
export const tidePoolSwatchNames = [
  { hex: '#1b7f86', label: 'pool teal' },
  { hex: '#3f7a4a', label: 'kelp green' },
  { hex: '#c8922b', label: 'ochre rock' },
  { hex: '#9a4a2c', label: 'rust rock' },
  { hex: '#e07a93', label: 'coralline pink' },
  { hex: '#e6d6b0', label: 'sand' },
] as const;

type DemoLine =
  | { kind: 'stock'; dye: string; depthOfShadePct: number }
  | { kind: 'foodColor'; dye: string; amountPer100g: number; unit: 'mL' | 'drop' | 'gGel' };

export interface DemoStep {
  instruction: string;
  timerSeconds?: number;
  temperatureC?: number;
  visualCue?: string;
  caution?: 'hotBath' | 'acid' | 'powder' | 'none';
  /** Index into the colorway's lines: the step measures that line. */
  line?: number;
}

export interface DemoColorway {
  name: string;
  technique: 'immersion' | 'dipGradient' | 'speckle' | 'layeredPour' | 'leftovers';
  base: string;
  pot: string;
  skeinCount: number;
  liquorRatio: number;
  acid: { acid: 'vinegar'; acidStrengthPct: number } | { acid: 'citric' };
  lines: DemoLine[];
  swatches: string[];
  notes: string;
  steps: DemoStep[];
}

const SIMMER_CUE =
  'Small bubbles on the bottom of the pot and steam rising; the surface barely moves. Never a rolling boil.';
const CLEAR_CUE = 'The water turns clear or nearly clear: the yarn has taken up the dye.';

const presoak: DemoStep = {
  instruction: 'Presoak the skein in lukewarm water with a drop of wool wash.',
  timerSeconds: 30 * 60,
};
const fill = (ml: string): DemoStep => ({
  instruction: `Fill the pot with ${ml} of water and set it on the stove.`,
});
const heat: DemoStep = {
  instruction: 'Heat the bath to a simmer.',
  temperatureC: 85,
  visualCue: SIMMER_CUE,
  caution: 'hotBath',
};
const acid: DemoStep = {
  instruction: 'Add the acid to the bath (acid into water, never the other way round) and stir.',
  caution: 'acid',
};
const hold: DemoStep = {
  instruction: 'Hold at a simmer until the water clears, turning the skein gently once.',
  timerSeconds: 10 * 60,
  temperatureC: 85,
  visualCue: CLEAR_CUE,
  caution: 'hotBath',
};
const rinse: DemoStep = {
  instruction:
    'Rinse in water the same temperature as the skein, squeeze gently (no wringing), roll in a towel and hang to dry.',
};

export const tidePoolColorways: DemoColorway[] = [
  {
    name: 'Rockpool Teal',
    technique: 'immersion',
    base: 'Wrackline Sock',
    pot: 'Big stainless stockpot',
    skeinCount: 3,
    liquorRatio: 30,
    acid: { acid: 'vinegar', acidStrengthPct: 5 },
    lines: [
      { kind: 'stock', dye: 'Brinewell Blue', depthOfShadePct: 0.8 },
      { kind: 'stock', dye: 'Kelpstrand Green', depthOfShadePct: 0.3 },
    ],
    swatches: ['pool teal', 'kelp green'],
    notes: 'Deep water in the middle of the pool. Blue exhausts last: give it the full hold.',
    steps: [
      presoak,
      fill('3 L per skein'),
      heat,
      acid,
      { instruction: 'Add the Brinewell Blue stock and stir.', line: 0, caution: 'hotBath' },
      { instruction: 'Add the Kelpstrand Green stock and stir.', line: 1, caution: 'hotBath' },
      {
        instruction: 'Lower the wet skeins in with tongs and press them under.',
        caution: 'hotBath',
      },
      hold,
      {
        instruction: 'Turn off the heat and let the skeins cool in the pot.',
        timerSeconds: 30 * 60,
        caution: 'hotBath',
      },
      rinse,
    ],
  },
  {
    name: 'Coralline & Ochre',
    technique: 'layeredPour',
    base: 'Headland DK',
    pot: 'Blue enamel pot',
    skeinCount: 2,
    liquorRatio: 20,
    acid: { acid: 'citric' },
    lines: [
      { kind: 'foodColor', dye: 'liquid food color — rose pink', amountPer100g: 3, unit: 'mL' },
      { kind: 'foodColor', dye: 'gel food color — ochre', amountPer100g: 0.5, unit: 'gGel' },
      { kind: 'foodColor', dye: 'liquid food color — teal', amountPer100g: 20, unit: 'drop' },
    ],
    swatches: ['coralline pink', 'ochre rock', 'sand'],
    notes:
      'Pink coralline on ochre rock with a glint of water. Non-superwash: no stirring, no sudden cold, or it felts.',
    steps: [
      presoak,
      fill('2 L per skein'),
      {
        instruction: 'Dissolve the citric acid in a cup of hot water and add it to the pot.',
        caution: 'acid',
      },
      {
        instruction: 'Lay the wet skein flat in the pot in loose loops.',
      },
      {
        instruction: 'Pour the rose pink over one third of the skein; do not stir.',
        line: 0,
      },
      {
        instruction:
          'Dissolve the ochre gel in a little hot water and pour it over the middle third.',
        line: 1,
      },
      {
        instruction: 'Drip the teal over the last third, a few drops at a time.',
        line: 2,
      },
      heat,
      hold,
      {
        instruction:
          'Turn off the heat and let the skein cool in the pot; moving wool to cold water makes it felt.',
        timerSeconds: 45 * 60,
        caution: 'hotBath',
      },
      rinse,
    ],
  },
  {
    name: 'Last Drop Tide Line',
    technique: 'leftovers',
    base: 'Wrackline Sock',
    pot: 'Big stainless stockpot',
    skeinCount: 1,
    liquorRatio: 30,
    acid: { acid: 'vinegar', acidStrengthPct: 5 },
    lines: [
      { kind: 'stock', dye: 'Brinewell Blue', depthOfShadePct: 0.15 },
      { kind: 'stock', dye: 'Kelpstrand Green', depthOfShadePct: 0.1 },
      { kind: 'stock', dye: 'Rustfall Orange', depthOfShadePct: 0.1 },
      { kind: 'stock', dye: 'Coralline Pink', depthOfShadePct: 0.05 },
    ],
    swatches: ['sand', 'rust rock', 'kelp green'],
    notes:
      'What is left in the month’s jars, all in one pot: a soft, muddy-in-a-good-way tide line. Amounts are what the jars usually hold at the end of the day.',
    steps: [
      presoak,
      fill('3 L'),
      heat,
      acid,
      { instruction: 'Pour in what is left of the Brinewell Blue.', line: 0, caution: 'hotBath' },
      { instruction: 'Pour in what is left of the Kelpstrand Green.', line: 1, caution: 'hotBath' },
      { instruction: 'Pour in what is left of the Rustfall Orange.', line: 2, caution: 'hotBath' },
      { instruction: 'Pour in what is left of the Coralline Pink.', line: 3, caution: 'hotBath' },
      {
        instruction: 'Lower the wet skein in with tongs and press it under.',
        caution: 'hotBath',
      },
      hold,
      {
        instruction: 'Turn off the heat and let the skein cool in the pot.',
        timerSeconds: 30 * 60,
        caution: 'hotBath',
      },
      rinse,
    ],
  },
];

export const tidePoolDyeAlong = {
  title: 'Tide Pool',
  description:
    'Rock pools at low tide: teal water over kelp, ochre and rust rocks, pink coralline and pale sand. Three colorways, one of them a last-drop skein from what is left in the jars. Dye along with liquid or gel food color, or with acid dyes.',
  timeZone: 'America/Halifax',
  /** Local start time on the host's clock, on the first Saturday three weeks after seeding. */
  localTime: '14:00',
  daysAfterSeed: 21,
  expectedLengthMin: 120,
  streamUrl: 'https://stream.example/wrackline-dyehouse',
  /** Viewers share their skeins for two weeks after the live session. */
  shareDays: 14,
  hostPrepItems: [
    { text: 'Set aside the jars you want to use up for the last-drop skein.', when: 'dayBefore' },
    { text: 'Prop your phone where you can see the stream and the stove.', when: 'hourBefore' },
  ],
} as const;
