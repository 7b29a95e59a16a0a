import { toDyeKitRecipe } from '@vatside/contracts/recipe';
import {
  acidFor,
  convert,
  scaleRecipe,
  toHouseholdMeasure,
  type HouseholdMeasure,
  type MeasureSystem,
} from '@vatside/dye-kit';
import type {
  ColorwayBath,
  Household,
  SupplyAcid,
  SupplyDye,
  SupplyEquipment,
  SupplyList,
  SupplyYarn,
} from '@vatside/contracts/dye-along-supplies';
import { DYE_SAFETY_NOTE } from '@vatside/contracts/workbench-common';
import type {
  FiberContentPart,
  StoredAcid,
  StoredRecipeLine,
  TargetSwatch,
} from '@vatside/db/schema';
import { withDyeKit } from './workbench-common.ts';

// The supply list of a dye-along: every colorway scaled with dye-kit (for the host's batch, or
// one skein of the participant's weight), then summed per dye, per acid and per base, with the
// equipment and cautions the run sheets call for. Pure: the caller loads the rows.

export interface SupplyStep {
  instruction: string;
  timerSeconds: number | null;
  temperatureC: number | null;
  caution: 'hotBath' | 'acid' | 'powder' | 'none';
}

export interface SupplyColorway {
  id: string;
  name: string;
  technique: ColorwayBath['technique'];
  skeinCount: number;
  weightOfGoodsG: number;
  liquorRatio: number;
  acid: StoredAcid;
  recipeLines: StoredRecipeLine[];
  targetSwatches: TargetSwatch[];
  base: {
    id: string;
    name: string;
    fiberContent: FiberContentPart[];
    superwash: boolean;
  } | null;
  pot: { name: string; capacityMl: number; material: string } | null;
  steps: SupplyStep[];
}

export type SupplyTarget = { scope: 'hostBatch' } | { scope: 'perSkein'; weightOfGoodsG: number };

export interface SupplyOptions {
  system: MeasureSystem;
  /** Stock solutions made from a liquid or gel rather than a powder (no dust mask for those). */
  liquidStockIds?: ReadonlySet<string>;
}

/** Fill a pot to at most this fraction: room for the yarn and a simmer (common practice). */
const POT_FILL_FRACTION = 0.8;
/** Mix a little more stock than the recipe takes, for spills and a re-dip (a product choice). */
const STOCK_SPARE_FACTOR = 1.25;
const STOCK_JAR_STEP_ML = 50;
const SMALLEST_STOCK_JAR_ML = 100;

export const DYE_ALONG_CAUTIONS = {
  hotBath:
    'Hot dye baths and steam scald: turn pot handles inward, lift yarn with tongs, and let the bath cool before you pour it out.',
  acid: 'Vinegar and citric acid sting eyes and cuts: wear gloves, and add acid to the water, never water to strong acid.',
  powder:
    'Dye powders are a fine dust: wear a dust mask and gloves while you mix stocks, and wipe spills with a damp cloth.',
  dedicated:
    'Pots, spoons and jars that touch dye stay dyeing tools: never use them for food again.',
  rules:
    'Follow the dye maker’s safety data sheet, your local wastewater rules and local codes; keep children and pets away from the stove.',
} as const;

const household = (m: HouseholdMeasure): Household => ({
  label: m.label,
  measuredMl: m.measuredMl,
  tooSmallToMeasure: m.tooSmallToMeasure,
});

function dyeKey(line: StoredRecipeLine): string {
  if (line.kind === 'stock') {
    const who = line.stockSolutionId ?? line.dyeName.trim().toLowerCase();
    return `stock:${who}:${line.stockStrengthPct}`;
  }
  return `food:${line.dyeId ?? line.colorName.trim().toLowerCase()}:${line.unit}`;
}

/** A jar size that holds what the recipes take plus a spare, in 50 mL steps, at least 100 mL. */
export function stockJarMl(neededMl: number): number {
  const withSpare = neededMl * STOCK_SPARE_FACTOR;
  return Math.max(
    SMALLEST_STOCK_JAR_ML,
    Math.ceil(withSpare / STOCK_JAR_STEP_ML) * STOCK_JAR_STEP_ML,
  );
}

const unique = <T>(items: T[]) => [...new Set(items)];

function litersLabel(ml: number, system: MeasureSystem): string {
  const liters = Math.ceil(ml / 100) / 10;
  if (system === 'metric') return `${liters} L`;
  // A US quart is a quarter gallon; rounded up to half quarts.
  const quarts = Math.ceil(convert(ml, 'mL', 'gal') * 4 * 2) / 2;
  return `${quarts} qt (${liters} L)`;
}

function equipmentFor(
  colorways: SupplyColorway[],
  baths: ColorwayBath[],
  target: SupplyTarget,
  system: MeasureSystem,
  usesPowder: boolean,
): SupplyEquipment[] {
  const items: SupplyEquipment[] = [];
  const add = (key: string, item: string, detail: string) => items.push({ key, item, detail });
  const biggestBathMl = Math.max(0, ...baths.map((b) => b.bathVolumeMl));
  const minPotMl = biggestBathMl / POT_FILL_FRACTION;
  if (target.scope === 'hostBatch') {
    const pots = [
      ...new Map(colorways.flatMap((c) => (c.pot ? [[c.pot.name, c.pot] as const] : []))).values(),
    ];
    for (const pot of pots) {
      const aluminum =
        pot.material === 'aluminum' ? ' Aluminum reacts with acid: use another pot.' : '';
      add(
        `pot:${pot.name}`,
        `Pot: ${pot.name}`,
        `${litersLabel(pot.capacityMl, system)}, ${pot.material === 'stainlessSteel' ? 'stainless steel' : pot.material}.${aluminum}`,
      );
    }
  }
  if (target.scope === 'perSkein' || colorways.some((c) => !c.pot)) {
    add(
      'pot',
      'A stainless steel or enamel pot',
      `Holds at least ${litersLabel(minPotMl, system)}, so the bath fills it no more than four-fifths; one per colorway if you dye them side by side. Not aluminum: it reacts with acid.`,
    );
  }
  add('heat', 'A stove or hot plate', 'With the area around it cleared.');
  if (colorways.some((c) => c.steps.some((s) => s.temperatureC !== null))) {
    add(
      'thermometer',
      'A thermometer',
      'Optional: every hot step also says what the bath looks like.',
    );
  }
  add(
    'spoons',
    'Measuring spoons and a measuring cup',
    'Kept for dyeing only (a separate set from the kitchen).',
  );
  const lines = colorways.flatMap((c) => c.recipeLines);
  if (lines.some((l) => l.kind === 'stock' || l.unit === 'mL')) {
    add(
      'syringe',
      'A syringe marked in mL',
      'Measures small amounts of stock or liquid color exactly.',
    );
  }
  if (usesPowder || lines.some((l) => l.kind === 'foodColor' && l.unit === 'gGel')) {
    add('scale', 'A pocket scale reading 0.01 g', 'For dye powder and gel color.');
  }
  if (lines.some((l) => l.kind === 'stock')) {
    add('jars', 'Jars with lids', 'One per stock solution, labeled with the dye and its strength.');
  }
  add('gloves', 'Rubber gloves', 'Dye stains skin; acid stings cuts.');
  if (usesPowder) add('mask', 'A dust mask', 'For mixing dye powders into stock solutions.');
  add(
    'utensils',
    'Tongs and a stirring spoon',
    'Kept for dyeing only: once dye touches them, never back to food.',
  );
  add('rinse', 'A sink or basin and old towels', 'For rinsing and rolling the skein dry.');
  return items;
}

/**
 * The supply list for the month's colorways. hostBatch: each colorway at the host's skein count
 * in the host's pot; perSkein: one skein of `weightOfGoodsG` of each colorway.
 */
export function supplyList(
  colorways: SupplyColorway[],
  target: SupplyTarget,
  options: SupplyOptions,
): SupplyList {
  const { system } = options;
  const dyes = new Map<string, SupplyDye>();
  const acids = new Map<string, SupplyAcid>();
  const yarn = new Map<string, SupplyYarn>();
  const baths: ColorwayBath[] = [];
  const warnings: SupplyList['warnings'] = [];
  let usesPowder = false;

  for (const c of colorways) {
    const recipe = toDyeKitRecipe(c, c.recipeLines);
    const scaled = withDyeKit('', () =>
      scaleRecipe(recipe, {
        ...(target.scope === 'hostBatch'
          ? { skeins: c.skeinCount }
          : { weightOfGoodsG: target.weightOfGoodsG }),
        system,
        ...(target.scope === 'hostBatch' && c.pot ? { potCapacityMl: c.pot.capacityMl } : {}),
      }),
    );
    for (const w of scaled.warnings) warnings.push({ ...w, colorway: c.name });

    for (const amount of scaled.lines) {
      const line = c.recipeLines[amount.lineIndex]!;
      const fromPowder =
        line.kind === 'stock' &&
        !(line.stockSolutionId && options.liquidStockIds?.has(line.stockSolutionId));
      usesPowder ||= fromPowder;
      const key = dyeKey(line);
      const known = dyes.get(key);
      const entry: SupplyDye = known ?? {
        key,
        kind: line.kind,
        name: amount.name,
        stockStrengthPct: line.kind === 'stock' ? line.stockStrengthPct : null,
        fromPowder,
        unit: amount.unit,
        amount: 0,
        volumeMl: amount.volumeMl === null ? null : 0,
        dyeMassG: amount.dyeMassG === null ? null : 0,
        household: null,
        approximate: amount.approximate,
        mix: null,
        colorways: [],
      };
      entry.amount += amount.amount;
      if (entry.volumeMl !== null) entry.volumeMl += amount.volumeMl ?? 0;
      if (entry.dyeMassG !== null) entry.dyeMassG += amount.dyeMassG ?? 0;
      entry.colorways = unique([...entry.colorways, c.name]);
      dyes.set(key, entry);
    }

    const acidLine = scaled.acid;
    const rule =
      acidLine.source === 'recipe'
        ? `${c.name}: the host's own amount, scaled to the skein.`
        : `${c.name}: ${
            acidFor({
              weightOfGoodsG: scaled.weightOfGoodsG,
              bathVolumeMl: scaled.bathVolumeMl,
              ...(c.acid.acid === 'vinegar'
                ? { acid: 'vinegar' as const, acidStrengthPct: c.acid.acidStrengthPct }
                : { acid: 'citric' as const }),
            }).rule
          }`;
    const acidKey = `${acidLine.acid}:${acidLine.acidStrengthPct ?? ''}`;
    const acid = acids.get(acidKey) ?? {
      acid: acidLine.acid,
      acidStrengthPct: acidLine.acidStrengthPct,
      amountMl: 0,
      household: household(toHouseholdMeasure(0, { system })),
      rules: [],
      colorways: [],
    };
    acid.amountMl += acidLine.amountMl;
    acid.rules.push(rule);
    acid.colorways = unique([...acid.colorways, c.name]);
    acids.set(acidKey, acid);

    const skeins = target.scope === 'hostBatch' ? c.skeinCount : 1;
    const skeinWeightG = target.scope === 'hostBatch' ? c.weightOfGoodsG : target.weightOfGoodsG;
    const yarnKey = `${c.base?.id ?? 'any'}:${skeinWeightG}`;
    const y = yarn.get(yarnKey) ?? {
      baseId: c.base?.id ?? null,
      name: c.base?.name ?? 'Protein-fiber yarn (wool, or a wool and nylon blend)',
      fiberContent: c.base?.fiberContent ?? [],
      superwash: c.base?.superwash ?? null,
      skeins: 0,
      skeinWeightG,
      totalWeightG: 0,
      colorways: [],
    };
    y.skeins += skeins;
    y.totalWeightG += skeins * skeinWeightG;
    y.colorways = unique([...y.colorways, c.name]);
    yarn.set(yarnKey, y);

    baths.push({
      colorwayId: c.id,
      name: c.name,
      technique: c.technique,
      skeins,
      weightOfGoodsG: scaled.weightOfGoodsG,
      bathVolumeMl: scaled.bathVolumeMl,
      water: household(scaled.water),
      lines: scaled.lines.map((l) => ({
        name: l.name,
        kind: l.kind,
        amount: l.amount,
        unit: l.unit,
        household: l.measurement.household ? household(l.measurement.household) : null,
        approximate: l.approximate,
      })),
      acid: {
        acid: acidLine.acid,
        acidStrengthPct: acidLine.acidStrengthPct,
        amountMl: acidLine.amountMl,
        household: household(acidLine.household),
        rule,
      },
      targetSwatches: c.targetSwatches,
    });
  }

  // Household measures of the sums, not sums of rounded measures.
  for (const dye of dyes.values()) {
    if (dye.unit === 'mL' && dye.volumeMl !== null) {
      dye.household = household(toHouseholdMeasure(dye.volumeMl, { system }));
    }
    if (dye.kind === 'stock' && dye.stockStrengthPct !== null && dye.volumeMl !== null) {
      const volumeMl = stockJarMl(dye.volumeMl);
      dye.mix = { volumeMl, powderG: (volumeMl * dye.stockStrengthPct) / 100 };
    }
  }
  for (const acid of acids.values()) {
    acid.household = household(toHouseholdMeasure(acid.amountMl, { system }));
  }

  const cautions: string[] = [DYE_ALONG_CAUTIONS.hotBath, DYE_ALONG_CAUTIONS.acid];
  if (usesPowder) cautions.push(DYE_ALONG_CAUTIONS.powder);
  cautions.push(DYE_ALONG_CAUTIONS.dedicated, DYE_ALONG_CAUTIONS.rules);

  return {
    scope: target.scope,
    system,
    weightOfGoodsG: target.scope === 'perSkein' ? target.weightOfGoodsG : null,
    dyes: [...dyes.values()],
    acid: [...acids.values()],
    yarn: [...yarn.values()],
    equipment: equipmentFor(colorways, baths, target, system, usesPowder),
    colorways: baths,
    cautions,
    warnings,
    safetyNote: DYE_SAFETY_NOTE,
  };
}
