import {
  depthOfShade,
  dyeMassG,
  dyeMassInStockG,
  stockVolumeMl,
  toHouseholdMeasure,
} from '@vatside/dye-kit';
import { SelectField } from '@vatside/ui/form/SelectField';
import { useState } from 'react';
import { formatAmount } from '../../../lib/format.ts';
import { Answer, attempt, Formula, NumberInput, toNumber, type CalcProps } from './calc-parts.tsx';

type Known = 'depth' | 'stock';

/** Depth of shade ↔ grams of dye ↔ mL of stock, either way round. */
export function DepthOfShadeCalculator({ system }: CalcProps) {
  const [known, setKnown] = useState<Known>('depth');
  const [weightG, setWeightG] = useState('100');
  const [depthPct, setDepthPct] = useState('1');
  const [strengthPct, setStrengthPct] = useState('1');
  const [stockMl, setStockMl] = useState('100');
  const weightOfGoodsG = toNumber(weightG);
  const stockStrengthPct = toNumber(strengthPct);

  const forward = attempt(() => {
    const input = { weightOfGoodsG, depthOfShadePct: toNumber(depthPct), stockStrengthPct };
    const ml = stockVolumeMl(input);
    return { grams: dyeMassG(input), ml, kitchen: toHouseholdMeasure(ml, { system }).label };
  });
  const backward = attempt(() => {
    const grams = dyeMassInStockG({ stockStrengthPct, volumeMl: toNumber(stockMl) });
    return { grams, depth: depthOfShade({ dyeMassG: grams, weightOfGoodsG }) };
  });

  return (
    <div className="space-y-4">
      <SelectField label="I know" value={known} onChange={(e) => setKnown(e.target.value as Known)}>
        <option value="depth">the depth of shade I want</option>
        <option value="stock">how much stock I used</option>
      </SelectField>
      <div className="grid gap-4 sm:grid-cols-3">
        <NumberInput label="Dry fiber weight" value={weightG} onChange={setWeightG} suffix="g" />
        <NumberInput
          label="Stock strength"
          hint="% w/v: grams per 100 mL"
          value={strengthPct}
          onChange={setStrengthPct}
          suffix="%"
        />
        {known === 'depth' ? (
          <NumberInput label="Depth of shade" value={depthPct} onChange={setDepthPct} suffix="%" />
        ) : (
          <NumberInput label="Stock used" value={stockMl} onChange={setStockMl} suffix="mL" />
        )}
      </div>
      {known === 'depth' ? (
        <Answer problem={forward.problem}>
          {forward.value ? (
            <p className="text-xl">
              Measure <strong>{formatAmount(forward.value.ml)} mL of stock</strong> (
              {forward.value.kitchen}), holding {formatAmount(forward.value.grams)} g of dye.
            </p>
          ) : null}
        </Answer>
      ) : (
        <Answer problem={backward.problem}>
          {backward.value ? (
            <p className="text-xl">
              That is <strong>{formatAmount(backward.value.depth)} % depth of shade</strong> (
              {formatAmount(backward.value.grams)} g of dye).
            </p>
          ) : null}
        </Answer>
      )}
      <Formula>
        grams of dye = fiber g × depth of shade % ÷ 100; mL of stock = grams of dye × 100 ÷ stock
        strength % (common practice).
      </Formula>
    </div>
  );
}
