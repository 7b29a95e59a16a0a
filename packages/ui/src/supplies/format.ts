import type { Household, SupplyDye } from '@vatside/contracts/dye-along-supplies';
import { convert, type MeasureSystem } from '@vatside/dye-kit';

// Display precision only: every amount shown comes from the server's dye-kit arithmetic.

const upTo = (digits: number) => new Intl.NumberFormat('en-US', { maximumFractionDigits: digits });
const formats = [upTo(0), upTo(1), upTo(2)] as const;

/** Fewer decimals as numbers grow: 0.25, 7.4, 120. */
export function formatQuantity(value: number): string {
  const size = Math.abs(value);
  return (size >= 100 ? formats[0] : size >= 10 ? formats[1] : formats[2]).format(value);
}

/** Metric liquid: mL under a liter, liters above. */
export const formatMl = (mL: number) =>
  mL >= 1000 ? `${formatQuantity(mL / 1000)} L` : `${formatQuantity(mL)} mL`;

/** Grams, with ounces beside them for US measures. */
export function formatGrams(grams: number, system: MeasureSystem): string {
  const metric = `${formatQuantity(grams)} g`;
  return system === 'us' ? `${metric} (${formatQuantity(convert(grams, 'g', 'oz'))} oz)` : metric;
}

/** An amount to measure: the big words and the small ones under them. */
export type MeasureText = { main: string; detail: string | null };

/** Spoons first in US measures, mL first in metric; "too small" says what to do instead. */
export function liquidMeasure(mL: number, household: Household | null, system: MeasureSystem) {
  const metric = formatMl(mL);
  if (!household) return { main: metric, detail: null };
  if (household.tooSmallToMeasure) {
    return { main: metric, detail: 'Too little for a spoon: measure it with a syringe.' };
  }
  return system === 'us'
    ? { main: household.label, detail: metric }
    : { main: metric, detail: household.label };
}

type DyeAmount = Pick<SupplyDye, 'unit' | 'amount' | 'household' | 'approximate'>;

/** How much of one dye: mL (spoons), drops or grams of gel. */
export function dyeMeasure(line: DyeAmount, system: MeasureSystem): MeasureText {
  if (line.unit === 'drop') {
    return { main: `about ${Math.round(line.amount)} drops`, detail: 'Drops vary by bottle.' };
  }
  if (line.unit === 'gGel')
    return { main: `${formatQuantity(line.amount)} g of gel`, detail: null };
  return liquidMeasure(line.amount, line.household, system);
}

export const acidName = (acid: 'vinegar' | 'citric', strengthPct: number | null) =>
  acid === 'vinegar'
    ? `Vinegar (${formatQuantity(strengthPct ?? 5)} % acetic acid)`
    : 'Citric acid crystals';

export const fiberText = (parts: { fiber: string; pct: number }[]) =>
  parts.map((p) => `${formatQuantity(p.pct)} % ${p.fiber}`).join(', ');
