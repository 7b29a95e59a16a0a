import type { DyeAgain } from '@vatside/contracts/archive';
import type { Batch, MeasureSystem } from '@vatside/dye-kit';
import { celsiusToFahrenheit } from '@vatside/dye-kit';
import { StepCaution } from '@vatside/ui/StepCaution';
import {
  acidName,
  dyeMeasure,
  formatGrams,
  formatMl,
  formatQuantity,
  liquidMeasure,
  type MeasureText,
} from '@vatside/ui/supplies/format.ts';
import { Swatch } from '@vatside/ui/Swatch';
import { WarningList } from '@vatside/ui/WarningList';
import { printSheetClass, type Paper } from '../../../components/PrintToolbar.tsx';

const cell = 'border border-wool-300 px-3 py-2 text-left align-top';

function Amount({ measure }: { measure: MeasureText }) {
  return (
    <>
      <span className="block font-bold">{measure.main}</span>
      {measure.detail ? <span className="block text-sm text-vat-800">{measure.detail}</span> : null}
    </>
  );
}

const batchDye = (line: Batch['lines'][number], system: MeasureSystem) =>
  dyeMeasure(
    {
      unit: line.unit,
      amount: line.amount,
      approximate: line.approximate,
      household: line.measurement.household,
    },
    system,
  );

/** One bath of the repeat: water, each dye, acid. */
function BatchTable({ batch, sheet }: { batch: Batch; sheet: DyeAgain }) {
  const title = `Batch ${batch.index + 1} of ${sheet.batches.length}${batch.skeins ? ` · ${batch.skeins} skein${batch.skeins === 1 ? '' : 's'}` : ''} · ${formatGrams(batch.weightOfGoodsG, sheet.system)} dry fiber`;
  return (
    <section aria-label={title} className="vs-keep space-y-2">
      <h3 className="text-lg font-bold">{title}</h3>
      <table>
        <thead>
          <tr className="bg-wool-100">
            <th scope="col" className={cell}>
              What
            </th>
            <th scope="col" className={cell}>
              How much
            </th>
          </tr>
        </thead>
        <tbody>
          <tr>
            <th scope="row" className={cell}>
              Water for the bath
            </th>
            <td className={cell}>
              <Amount measure={liquidMeasure(batch.bathVolumeMl, batch.water, sheet.system)} />
            </td>
          </tr>
          {batch.lines.map((line) => (
            <tr key={line.lineIndex}>
              <th scope="row" className={cell}>
                {line.kind === 'stock'
                  ? `${line.name} (${formatQuantity(sheet.lines[line.lineIndex]?.stockStrengthPct ?? 0)} % stock)`
                  : line.name}
              </th>
              <td className={cell}>
                <Amount measure={batchDye(line, sheet.system)} />
              </td>
            </tr>
          ))}
          <tr>
            <th scope="row" className={cell}>
              {acidName(batch.acid.acid, batch.acid.acidStrengthPct)}
            </th>
            <td className={cell}>
              <Amount
                measure={liquidMeasure(batch.acid.amountMl, batch.acid.household, sheet.system)}
              />
            </td>
          </tr>
        </tbody>
      </table>
    </section>
  );
}

/** An archived colorway dyed again: the recipe from the actual amounts, what to mix, each batch. */
export function BatchSheet({
  sheet,
  studioName,
  paper,
}: {
  sheet: DyeAgain;
  studioName: string;
  paper: Paper;
}) {
  const toMix = sheet.shelf.filter((s) => s.status !== 'enough');
  const bath = sheet.bathRecord;
  return (
    <article aria-labelledby="sheet-title" className={printSheetClass(paper)}>
      <header className="space-y-1 border-b-2 border-vat-800 pb-3">
        <p className="text-sm font-bold tracking-wide uppercase">Batch sheet · {studioName}</p>
        <h1 id="sheet-title" className="font-display text-4xl font-semibold">
          {sheet.colorwayName}, dyed again
        </h1>
        <p>
          {sheet.skeins} skein{sheet.skeins === 1 ? '' : 's'} of {sheet.base.name} (
          {formatGrams(sheet.base.skeinWeightG, sheet.system)} each
          {sheet.base.lot ? `, lot ${sheet.base.lot}` : ''})
          {sheet.pot ? ` in the ${sheet.pot.name} (${formatMl(sheet.pot.capacityMl)})` : ''}
        </p>
        <p className="text-sm">
          First dyed in {sheet.dyeAlongTitle}, {sheet.monthLabel}. Amounts come from the dye log of
          that day on {formatQuantity(sheet.fiberWeightDyedG)} g of dry fiber, at a{' '}
          {formatQuantity(sheet.liquorRatio)}:1 liquor ratio.
        </p>
      </header>

      {sheet.swatches.length ? (
        <section aria-labelledby="sheet-palette" className="vs-keep space-y-2">
          <h2 id="sheet-palette" className="text-xl font-bold">
            Palette
          </h2>
          <ul className="vs-swatches flex flex-wrap gap-x-6 gap-y-3">
            {sheet.swatches.map((s) => (
              <li key={`${s.hex}-${s.name}`}>
                <Swatch hex={s.hex} label={s.name || s.hex} showHex />
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section aria-labelledby="sheet-recipe" className="vs-keep space-y-2">
        <h2 id="sheet-recipe" className="text-xl font-bold">
          Recipe from the actual amounts
        </h2>
        <table>
          <thead>
            <tr className="bg-wool-100">
              <th scope="col" className={cell}>
                Dye
              </th>
              <th scope="col" className={cell}>
                Strength
              </th>
              <th scope="col" className={cell}>
                All skeins together
              </th>
            </tr>
          </thead>
          <tbody>
            {sheet.lines.map((line, i) => (
              <tr key={i}>
                <th scope="row" className={cell}>
                  {line.name}
                  {line.from === 'planned' ? (
                    <span className="block text-sm font-normal">
                      Not logged that day: the plan’s amount is used.
                    </span>
                  ) : null}
                </th>
                <td className={cell}>
                  {line.depthOfShadePct !== null
                    ? `${formatQuantity(line.depthOfShadePct)} % depth of shade (${formatQuantity(line.stockStrengthPct ?? 0)} % stock)`
                    : `${formatQuantity(line.amountPer100g ?? 0)} ${line.unit === 'gGel' ? 'g of gel' : line.unit === 'drop' ? 'drops' : 'mL'} per 100 g of dry fiber`}
                </td>
                <td className={cell}>
                  {formatQuantity(line.totalAmount)}{' '}
                  {line.unit === 'gGel' ? 'g of gel' : line.unit === 'drop' ? 'drops' : 'mL'}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section aria-labelledby="sheet-shelf" className="vs-keep space-y-2">
        <h2 id="sheet-shelf" className="text-xl font-bold">
          {toMix.length ? 'Mix these first' : 'The dye shelf'}
        </h2>
        {sheet.shelf.length === 0 ? (
          <p>No stock solutions in this recipe: food colors are measured from the bottle.</p>
        ) : (
          <ul className="space-y-1">
            {sheet.shelf.map((s) => (
              <li key={`${s.dyeName}-${s.stockStrengthPct}`}>
                <span className="font-bold">
                  {s.status === 'enough'
                    ? '✓ Enough: '
                    : s.status === 'short'
                      ? '✕ Short: '
                      : '✕ Missing: '}
                </span>
                {s.dyeName} {formatQuantity(s.stockStrengthPct)} % stock: needs{' '}
                {formatMl(s.neededMl)}, the shelf holds {formatMl(s.onShelfMl)}.
                {s.status === 'enough'
                  ? ''
                  : ` Mix ${formatMl(s.mixMl)} (${formatQuantity(s.mixDyePowderG)} g of dye powder made up to ${formatMl(s.mixMl)} with water).`}
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="sheet-batches" className="space-y-4">
        <h2 id="sheet-batches" className="text-xl font-bold">
          {sheet.batches.length === 1 ? 'The bath' : `${sheet.batches.length} batches`}
        </h2>
        {sheet.batches.map((batch) => (
          <BatchTable key={batch.index} batch={batch} sheet={sheet} />
        ))}
        <p>
          That day the bath reached{' '}
          {bath.temperatureReachedC === null
            ? 'a temperature that was not noted'
            : `${formatQuantity(bath.temperatureReachedC)} °C (${formatQuantity(celsiusToFahrenheit(bath.temperatureReachedC))} °F)`}
          {bath.timeAtTemperatureMin === null
            ? ''
            : ` and held there ${bath.timeAtTemperatureMin} minutes`}
          {bath.bathExhausted === null
            ? '.'
            : bath.bathExhausted
              ? '; the water cleared.'
              : '; color stayed in the water.'}
        </p>
      </section>

      <WarningList warnings={sheet.warnings} />

      <section aria-labelledby="sheet-cautions" className="vs-keep space-y-2">
        <h2 id="sheet-cautions" className="text-xl font-bold">
          <span aria-hidden="true">⚠ </span>Cautions
        </h2>
        <StepCaution kind="hotBath" />
        <StepCaution kind="acid" />
        <StepCaution kind="powder" />
        <p>{sheet.safetyNote} Local wastewater rules and local codes come first too.</p>
      </section>
    </article>
  );
}
