import type { ColorwayDetail } from '@vatside/contracts/workbench-colorways';
import { formatAmount } from '../../../lib/format.ts';

export type LineAmountLabel = { id: string; name: string; amount: string };

/** Each recipe line's server-computed amount in words, for run-sheet steps that measure it. */
export function lineAmountLabels(colorway: ColorwayDetail): LineAmountLabel[] {
  return colorway.computed.amounts.lines.map((amount) => {
    const line = colorway.recipeLines[amount.lineIndex];
    const unit = amount.unit === 'drop' ? 'drops' : amount.unit === 'gGel' ? 'g of gel' : 'mL';
    const kitchen = amount.measurement.household?.label;
    return {
      id: line?.id ?? String(amount.lineIndex),
      name: amount.name,
      amount: `${formatAmount(amount.amount)} ${unit}${kitchen ? ` (${kitchen})` : ''}`,
    };
  });
}
