import {
  colorwayCreateSchema,
  type ColorwayCreate,
  type ColorwaySummary,
  type RecipeLineInput,
} from '@vatside/contracts/workbench-colorways';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import type { Resolver } from 'react-hook-form';

// The editor holds numbers as typed text and both kinds of line in one shape, so a line can
// switch kind without losing what was typed. Field names match the API's, so server `fields`
// errors land on the right inputs.

export type LineDraft = {
  id?: string;
  kind: 'stock' | 'foodColor';
  stockSolutionId: string;
  dyeName: string;
  stockStrengthPct: string;
  depthOfShadePct: string;
  dyeId: string;
  colorName: string;
  amountPer100g: string;
  unit: 'mL' | 'drop' | 'gGel';
};

export type ColorwayDraft = {
  name: string;
  technique: ColorwayCreate['technique'];
  baseId: string;
  potId: string;
  skeinCount: string;
  weightOfGoodsG: string;
  liquorRatio: string;
  acid: { acid: 'vinegar' | 'citric'; acidStrengthPct: string; amountMl: string };
  recipeLines: LineDraft[];
  targetSwatches: { hex: string; name: string }[];
  notes: string;
};

export const blankLine = (kind: LineDraft['kind']): LineDraft => ({
  kind,
  stockSolutionId: '',
  dyeName: '',
  stockStrengthPct: '',
  depthOfShadePct: kind === 'stock' ? '1' : '',
  dyeId: '',
  colorName: '',
  amountPer100g: kind === 'foodColor' ? '1' : '',
  unit: 'mL',
});

const text = (n: number | undefined) => (n === undefined ? '' : String(n));
/** Blank stays blank (undefined) so the schema says "fill this in" rather than "0". */
const num = (s: string) => (s.trim() === '' ? undefined : Number(s));
const orUndefined = (s: string) => (s.trim() === '' ? undefined : s);

export function toDraft(colorway: ColorwaySummary): ColorwayDraft {
  return {
    name: colorway.name,
    technique: colorway.technique,
    baseId: colorway.baseId ?? '',
    potId: colorway.potId ?? '',
    skeinCount: text(colorway.skeinCount),
    weightOfGoodsG: text(colorway.weightOfGoodsG),
    liquorRatio: text(colorway.liquorRatio),
    acid: {
      acid: colorway.acid.acid,
      acidStrengthPct: colorway.acid.acid === 'vinegar' ? text(colorway.acid.acidStrengthPct) : '5',
      amountMl: text(colorway.acid.amountMl),
    },
    recipeLines: colorway.recipeLines.map((line) =>
      line.kind === 'stock'
        ? {
            ...blankLine('stock'),
            id: line.id,
            stockSolutionId: line.stockSolutionId ?? '',
            dyeName: line.stockSolutionId ? '' : line.dyeName,
            stockStrengthPct: line.stockSolutionId ? '' : text(line.stockStrengthPct),
            depthOfShadePct: text(line.depthOfShadePct),
          }
        : {
            ...blankLine('foodColor'),
            id: line.id,
            dyeId: line.dyeId ?? '',
            colorName: line.dyeId ? '' : line.colorName,
            amountPer100g: text(line.amountPer100g),
            unit: line.unit,
          },
    ),
    targetSwatches: colorway.targetSwatches,
    notes: colorway.notes,
  };
}

function lineBody(line: LineDraft): RecipeLineInput {
  const id = line.id ? { id: line.id } : {};
  if (line.kind === 'stock') {
    // A jar from the shelf brings its own dye name and strength.
    const fromShelf = line.stockSolutionId !== '';
    return {
      ...id,
      kind: 'stock',
      stockSolutionId: fromShelf ? line.stockSolutionId : null,
      dyeName: fromShelf ? undefined : orUndefined(line.dyeName),
      stockStrengthPct: fromShelf ? undefined : num(line.stockStrengthPct),
      depthOfShadePct: num(line.depthOfShadePct) as number,
    };
  }
  const fromShelf = line.dyeId !== '';
  return {
    ...id,
    kind: 'foodColor',
    dyeId: fromShelf ? line.dyeId : null,
    colorName: fromShelf ? undefined : orUndefined(line.colorName),
    amountPer100g: num(line.amountPer100g) as number,
    unit: line.unit,
  };
}

/** The draft as the API's colorway body (before the shared schema checks it). */
export function toBody(draft: ColorwayDraft): ColorwayCreate {
  return {
    name: draft.name,
    technique: draft.technique,
    baseId: draft.baseId || null,
    potId: draft.potId || null,
    skeinCount: num(draft.skeinCount) as number,
    weightOfGoodsG: num(draft.weightOfGoodsG),
    liquorRatio: num(draft.liquorRatio) as number,
    acid:
      draft.acid.acid === 'vinegar'
        ? {
            acid: 'vinegar',
            acidStrengthPct: num(draft.acid.acidStrengthPct) as number,
            amountMl: num(draft.acid.amountMl),
          }
        : { acid: 'citric', amountMl: num(draft.acid.amountMl) },
    recipeLines: draft.recipeLines.map(lineBody),
    targetSwatches: draft.targetSwatches,
    notes: draft.notes,
  };
}

const schemaResolver = formResolver(colorwayCreateSchema);

/** Checks the draft with the shared colorway schema; submit receives the API body. */
export const colorwayResolver: Resolver<ColorwayDraft> = (values, context, options) =>
  (schemaResolver as unknown as Resolver<ColorwayCreate>)(
    toBody(values),
    context,
    options as never,
  ) as never;
