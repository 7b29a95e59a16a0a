import { bathVolumeMl, convert, toHouseholdMeasure } from '@vatside/dye-kit';
import { useState } from 'react';
import { formatAmount, formatVolumeMl } from '../../../lib/format.ts';
import { Answer, attempt, Formula, NumberInput, toNumber, type CalcProps } from './calc-parts.tsx';

/** Water for a bath at a liquor ratio. */
export function BathCalculator({ system }: CalcProps) {
  const [weightG, setWeightG] = useState('100');
  const [ratio, setRatio] = useState('30');
  const result = attempt(() => {
    const ml = bathVolumeMl({ weightOfGoodsG: toNumber(weightG), liquorRatio: toNumber(ratio) });
    return {
      ml,
      kitchen: toHouseholdMeasure(ml, { system }).label,
      quarts: convert(ml, 'mL', 'gal') * 4,
    };
  });
  return (
    <div className="space-y-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <NumberInput label="Dry fiber weight" value={weightG} onChange={setWeightG} suffix="g" />
        <NumberInput
          label="Liquor ratio"
          hint="Water to fiber by weight; 30 means 30:1."
          value={ratio}
          onChange={setRatio}
          suffix=": 1"
        />
      </div>
      <Answer problem={result.problem}>
        {result.value ? (
          <p className="text-xl">
            Fill the pot with <strong>{formatVolumeMl(result.value.ml)}</strong> of water (
            {result.value.kitchen}
            {system === 'us' ? `, about ${formatAmount(result.value.quarts)} US qt` : ''}).
          </p>
        ) : null}
      </Answer>
      <Formula>
        bath mL = fiber g × liquor ratio, taking water as 1 g per mL (common practice).
      </Formula>
    </div>
  );
}
