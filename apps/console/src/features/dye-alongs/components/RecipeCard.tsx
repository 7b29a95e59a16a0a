import type { ColorwayBath, SupplyList } from '@vatside/contracts/dye-along-supplies';
import type { Step } from '@vatside/contracts/workbench-colorways';
import { celsiusToFahrenheit, type MeasureSystem } from '@vatside/dye-kit';
import { cx } from '@vatside/ui/cx.ts';
import { StepCaution } from '@vatside/ui/StepCaution';
import {
  acidName,
  dyeMeasure,
  fiberText,
  formatGrams,
  formatQuantity,
  liquidMeasure,
  type MeasureText,
} from '@vatside/ui/supplies/format.ts';
import { Swatch } from '@vatside/ui/Swatch';
import type { ScaledBath } from '../hooks/use-recipe-card.ts';
import { printSheetClass, type Paper } from '../../../components/PrintToolbar.tsx';

type Row = { what: string; measure: (bath: ColorwayBath) => MeasureText | null };

/** The rows every bath has: each dye line, then water and acid. */
function rowsOf(bath: ColorwayBath, system: MeasureSystem): Row[] {
  return [
    ...bath.lines.map((line, i) => ({
      what: line.kind === 'stock' ? `${line.name} (stock)` : line.name,
      measure: (b: ColorwayBath) => {
        const same = b.lines[i];
        return same ? dyeMeasure(same, system) : null;
      },
    })),
    {
      what: 'Water for the bath',
      measure: (b: ColorwayBath) => liquidMeasure(b.bathVolumeMl, b.water, system),
    },
    {
      what: acidName(bath.acid.acid, bath.acid.acidStrengthPct),
      measure: (b: ColorwayBath) => liquidMeasure(b.acid.amountMl, b.acid.household, system),
    },
  ];
}

function Amount({ measure }: { measure: MeasureText | null }) {
  if (!measure) return <>—</>;
  return (
    <>
      <span className="block font-bold">{measure.main}</span>
      {measure.detail ? <span className="block text-sm text-vat-800">{measure.detail}</span> : null}
    </>
  );
}

const cellClass = 'border border-wool-300 px-3 py-2 align-top';

/** One colorway on one sheet: palette, amounts for the host's batch and other skeins, steps, cautions. */
export function RecipeCard({
  studioName,
  dyeAlongTitle,
  startsLabel,
  paper,
  system,
  supplies,
  hostBath,
  scaled,
  steps,
}: {
  studioName: string;
  dyeAlongTitle: string;
  startsLabel: string;
  paper: Paper;
  system: MeasureSystem;
  supplies: SupplyList;
  hostBath: ColorwayBath;
  scaled: ScaledBath[];
  steps: Step[];
}) {
  const rows = rowsOf(hostBath, system);
  const yarn = supplies.yarn.find((y) => y.colorways.includes(hostBath.name));
  const warnings = supplies.warnings.filter((w) => w.colorway === hostBath.name);
  return (
    <article aria-labelledby="card-title" className={printSheetClass(paper)}>
      <header className="space-y-1 border-b-2 border-vat-800 pb-3">
        <p className="text-sm font-bold tracking-wide uppercase">Recipe card · {studioName}</p>
        <h1 id="card-title" className="font-display text-4xl font-semibold">
          {hostBath.name}
        </h1>
        <p>
          {dyeAlongTitle} · {startsLabel}
        </p>
      </header>

      <section aria-labelledby="palette-title" className="vs-keep space-y-2">
        <h2 id="palette-title" className="text-xl font-bold">
          Palette
        </h2>
        {hostBath.targetSwatches.length === 0 ? (
          <p>No target colors were set for this colorway.</p>
        ) : (
          <ul className="vs-swatches flex flex-wrap gap-x-6 gap-y-3">
            {hostBath.targetSwatches.map((swatch) => (
              <li key={`${swatch.hex}-${swatch.name}`}>
                <Swatch hex={swatch.hex} label={swatch.name || swatch.hex} showHex />
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="host-title" className="vs-keep space-y-2">
        <h2 id="host-title" className="text-xl font-bold">
          Your batch
        </h2>
        <p>
          {hostBath.skeins} × {formatGrams(hostBath.weightOfGoodsG / hostBath.skeins, system)}
          {yarn ? ` of ${yarn.name}` : ''}
          {yarn && yarn.fiberContent.length > 0 ? ` (${fiberText(yarn.fiberContent)})` : ''} ·{' '}
          {formatGrams(hostBath.weightOfGoodsG, system)} dry fiber in all
        </p>
        <div className="overflow-x-auto">
          <table>
            <thead>
              <tr>
                <th scope="col" className={cx(cellClass, 'text-left')}>
                  What
                </th>
                <th scope="col" className={cx(cellClass, 'text-left')}>
                  Amount
                </th>
              </tr>
            </thead>
            <tbody>
              {rows.map((row) => (
                <tr key={row.what}>
                  <th scope="row" className={cx(cellClass, 'text-left')}>
                    {row.what}
                  </th>
                  <td className={cellClass}>
                    <Amount measure={row.measure(hostBath)} />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p className="text-sm">Acid rule: {hostBath.acid.rule}</p>
      </section>

      <section aria-labelledby="weights-title" className="space-y-2">
        <h2 id="weights-title" className="text-xl font-bold">
          For other skein weights
        </h2>
        <p className="text-sm">
          One skein of each weight, in its own bath at the same liquor ratio.
        </p>
        <div className="overflow-x-auto">
          <table>
            <thead>
              <tr>
                <th scope="col" className={cx(cellClass, 'text-left')}>
                  What
                </th>
                {scaled.map(({ weightOfGoodsG }) => (
                  <th key={weightOfGoodsG} scope="col" className={cx(cellClass, 'text-left')}>
                    {formatGrams(weightOfGoodsG, system)}
                  </th>
                ))}
              </tr>
            </thead>
            <tbody>
              {rows.map((row) => (
                <tr key={row.what}>
                  <th scope="row" className={cx(cellClass, 'text-left')}>
                    {row.what}
                  </th>
                  {scaled.map(({ weightOfGoodsG, bath }) => (
                    <td key={weightOfGoodsG} className={cellClass}>
                      <Amount measure={bath ? row.measure(bath) : null} />
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="steps-title" className="space-y-2">
        <h2 id="steps-title" className="text-xl font-bold">
          Run sheet
        </h2>
        {steps.length === 0 ? (
          <p>No steps yet.</p>
        ) : (
          <ol className="space-y-3">
            {steps.map((step, i) => (
              <li key={step.id} className="flex gap-3">
                <span className="w-7 shrink-0 text-right font-bold">{i + 1}.</span>
                <div className="min-w-0 space-y-1">
                  <p className="font-bold">{step.instruction}</p>
                  <StepFacts step={step} />
                  <StepCaution kind={step.caution} />
                </div>
              </li>
            ))}
          </ol>
        )}
      </section>

      <section
        aria-labelledby="cautions-title"
        className="vs-keep space-y-2 rounded-xl border-2 border-marigold-500 p-4"
      >
        <h2 id="cautions-title" className="text-xl font-bold">
          <span aria-hidden="true">⚠ </span>Cautions
        </h2>
        <ul className="list-disc space-y-1 pl-5">
          {warnings.map((w) => (
            <li key={`${w.code}-${w.lineIndex ?? ''}`}>{w.message}</li>
          ))}
          {supplies.cautions.map((caution) => (
            <li key={caution}>{caution}</li>
          ))}
        </ul>
        <p className="font-bold">{supplies.safetyNote}</p>
      </section>
    </article>
  );
}

function StepFacts({ step }: { step: Step }) {
  const facts = [
    step.timerSeconds !== null ? `Timer ${formatMinutes(step.timerSeconds)}` : null,
    step.temperatureC !== null
      ? `${formatQuantity(step.temperatureC)} °C / ${formatQuantity(celsiusToFahrenheit(step.temperatureC))} °F`
      : null,
    step.visualCue ? `Looks like: ${step.visualCue}` : null,
  ].filter((fact): fact is string => fact !== null);
  if (facts.length === 0) return null;
  return <p className="text-vat-800">{facts.join(' · ')}</p>;
}

/** 1800 → "30 min", 90 → "1 min 30 s". */
function formatMinutes(seconds: number): string {
  const min = Math.floor(seconds / 60);
  const s = seconds % 60;
  if (min === 0) return `${s} s`;
  return s === 0 ? `${min} min` : `${min} min ${s} s`;
}
