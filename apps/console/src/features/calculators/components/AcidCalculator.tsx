import { acidFor, bathVolumeMl } from '@vatside/dye-kit';
import { SelectField } from '@vatside/ui/form/SelectField';
import { WarningList } from '@vatside/ui/WarningList';
import { useState } from 'react';
import { formatAmount } from '../../../lib/format.ts';
import { Answer, attempt, Formula, NumberInput, toNumber, type CalcProps } from './calc-parts.tsx';

/** Vinegar or citric acid for a bath, by dye-kit's common-practice rule. */
export function AcidCalculator({ system }: CalcProps) {
  const [acid, setAcid] = useState<'vinegar' | 'citric'>('vinegar');
  const [weightG, setWeightG] = useState('100');
  const [ratio, setRatio] = useState('30');
  const [strengthPct, setStrengthPct] = useState('5');
  const weightOfGoodsG = toNumber(weightG);

  const result = attempt(() =>
    acidFor({
      weightOfGoodsG,
      bathVolumeMl: bathVolumeMl({ weightOfGoodsG, liquorRatio: toNumber(ratio) }),
      ...(acid === 'vinegar' ? { acid, acidStrengthPct: toNumber(strengthPct) } : { acid }),
    }),
  );

  return (
    <div className="space-y-4">
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Acid"
          value={acid}
          onChange={(e) => setAcid(e.target.value as 'vinegar' | 'citric')}
        >
          <option value="vinegar">Vinegar</option>
          <option value="citric">Citric acid crystals</option>
        </SelectField>
        <NumberInput label="Dry fiber weight" value={weightG} onChange={setWeightG} suffix="g" />
        <NumberInput label="Liquor ratio" value={ratio} onChange={setRatio} suffix=": 1" />
        {acid === 'vinegar' ? (
          <NumberInput
            label="Vinegar strength"
            value={strengthPct}
            onChange={setStrengthPct}
            suffix="% acetic"
          />
        ) : null}
      </div>
      <Answer problem={result.problem}>
        {result.value ? (
          <p className="text-xl">
            Add <strong>{formatAmount(result.value.recommendedMl)} mL</strong> (
            {result.value.household[system].label}); anywhere from{' '}
            {formatAmount(result.value.rangeMl.min)} to {formatAmount(result.value.rangeMl.max)} mL
            works.
          </p>
        ) : null}
      </Answer>
      {result.value ? <WarningList warnings={result.value.warnings} /> : null}
      <Formula>{result.value?.rule ?? 'see the rule once the inputs are complete.'}</Formula>
    </div>
  );
}
