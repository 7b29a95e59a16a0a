import { lastDrop, toHouseholdMeasure } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { TextField } from '@vatside/ui/form/TextField';
import { Swatch } from '@vatside/ui/Swatch';
import { WarningList } from '@vatside/ui/WarningList';
import { useState } from 'react';
import { formatAmount, formatVolumeMl } from '../../../lib/format.ts';
import { Answer, attempt, Formula, NumberInput, toNumber, type CalcProps } from './calc-parts.tsx';

type Jar = { key: number; strengthPct: string; volumeMl: string; color: string };

const firstJars: Jar[] = [
  { key: 1, strengthPct: '1', volumeMl: '40', color: '#1f7a8c' },
  { key: 2, strengthPct: '1', volumeMl: '25', color: '#e9a21b' },
];

/** Leftover jars poured together for one skein: how deep, how far to dilute, what color. */
export function LastDropCalculator({ system }: CalcProps) {
  const [jars, setJars] = useState(firstJars);
  const [weightG, setWeightG] = useState('100');
  const change = (key: number, patch: Partial<Jar>) =>
    setJars((all) => all.map((jar) => (jar.key === key ? { ...jar, ...patch } : jar)));

  const result = attempt(() =>
    lastDrop({
      weightOfGoodsG: toNumber(weightG),
      leftovers: jars.map((jar) => ({
        stockStrengthPct: toNumber(jar.strengthPct),
        volumeMl: toNumber(jar.volumeMl),
        color: jar.color,
      })),
    }),
  );
  const r = result.value;

  return (
    <div className="space-y-4">
      <NumberInput
        label="Dry weight of the leftovers skein"
        value={weightG}
        onChange={setWeightG}
        suffix="g"
      />
      <ol className="space-y-3">
        {jars.map((jar, i) => (
          <li key={jar.key}>
            <fieldset className="flex flex-wrap items-end gap-3 rounded-xl border-2 border-wool-300 bg-white p-3">
              <legend className="px-1 font-bold">Jar {i + 1}</legend>
              <NumberInput
                label="Strength"
                className="w-36"
                value={jar.strengthPct}
                onChange={(v) => change(jar.key, { strengthPct: v })}
                suffix="%"
              />
              <NumberInput
                label="Left in the jar"
                className="w-40"
                value={jar.volumeMl}
                onChange={(v) => change(jar.key, { volumeMl: v })}
                suffix="mL"
              />
              <TextField
                label="Color it dyes"
                type="color"
                className="w-36"
                value={jar.color}
                onChange={(e) => change(jar.key, { color: e.target.value })}
              />
              {jars.length > 1 ? (
                <Button
                  variant="secondary"
                  onClick={() => setJars(jars.filter((j) => j.key !== jar.key))}
                >
                  Remove jar {i + 1}
                </Button>
              ) : null}
            </fieldset>
          </li>
        ))}
      </ol>
      <Button
        variant="secondary"
        onClick={() =>
          setJars([
            ...jars,
            {
              key: Math.max(0, ...jars.map((j) => j.key)) + 1,
              strengthPct: '1',
              volumeMl: '10',
              color: '#b8432a',
            },
          ])
        }
      >
        Add a jar
      </Button>
      <Answer problem={result.problem}>
        {r ? (
          <div className="space-y-2 text-lg">
            <p>
              All together: <strong>{formatAmount(r.totalDyeMassG)} g of dye</strong> in{' '}
              {formatVolumeMl(r.totalVolumeMl)}, which gives{' '}
              <strong>{formatAmount(r.depthOfShadePct)} % depth of shade</strong> on this skein.
            </p>
            <p>
              {r.spread.waterToAddMl > 0
                ? `Add ${formatVolumeMl(r.spread.waterToAddMl)} of water (${toHouseholdMeasure(r.spread.waterToAddMl, { system }).label}) so it reaches the whole skein; the mix is then ${formatAmount(r.spread.dilutedStrengthPct)} %.`
                : 'No water to add.'}
            </p>
            {r.mixPreview ? (
              <div className="flex flex-wrap items-center gap-3">
                <Swatch hex={r.mixPreview.hex} label={`Mixed: ${r.mixPreview.name}`} showHex />
                <span className="text-sm text-vat-800">
                  An approximate preview, not a promise of the dyed skein.
                </span>
              </div>
            ) : null}
          </div>
        ) : null}
      </Answer>
      {r ? <WarningList warnings={r.warnings} /> : null}
      <Formula>
        dye g in a jar = strength % × mL ÷ 100; depth of shade = total dye g ÷ fiber g × 100; the
        mix preview adds K/S per channel weighted by dye mass (single-constant Kubelka–Munk, 1931).
      </Formula>
    </div>
  );
}
