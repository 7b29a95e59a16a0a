import type { ComputedAmounts } from '@vatside/contracts/workbench-colorways';
import type { LineAmount } from '@vatside/dye-kit';
import { WarningList } from '@vatside/ui/WarningList';
import { formatAmount, formatVolumeMl } from '../../../lib/format.ts';

const systemNames = { us: 'US kitchen measures', metric: 'Metric spoons' } as const;

/** What is measured, metric: mL of stock with its grams of dye, drops, or gel by weight. */
function MetricCell({ line }: { line: LineAmount }) {
  const [main, detail] =
    line.kind === 'stock'
      ? [`${formatAmount(line.amount)} mL`, `of stock · ${formatAmount(line.dyeMassG ?? 0)} g dye`]
      : line.unit === 'drop'
        ? [`${formatAmount(line.amount)} drops`, `≈ ${formatAmount(line.volumeMl ?? 0)} mL`]
        : line.unit === 'gGel'
          ? [`${formatAmount(line.amount)} g`, 'of gel']
          : [`${formatAmount(line.amount)} mL`, 'of color'];
  return (
    <>
      <span className="block text-xl font-bold whitespace-nowrap">{main}</span>
      <span className="block text-sm text-vat-800">{detail}</span>
    </>
  );
}

/** How it is measured at home, as dye-kit rounded it. */
function kitchenLabel(line: LineAmount): string {
  const { measurement } = line;
  if (measurement.tooSmall) return 'Too little to measure: see the notes';
  if (measurement.household) return measurement.household.label;
  if (line.unit === 'drop') return `${formatAmount(measurement.roundedAmount)} drops`;
  return `${formatAmount(measurement.roundedAmount)} g on a 0.01 g scale`;
}

/** The server's amounts for one bath (or several), metric and kitchen measures side by side. */
export function AmountsView({ computed, caption }: { computed: ComputedAmounts; caption: string }) {
  const { amounts, acid } = computed;
  const acidName =
    amounts.acid.acid === 'vinegar'
      ? `Vinegar (${formatAmount(amounts.acid.acidStrengthPct ?? 0)} % acetic acid)`
      : 'Citric acid crystals';
  return (
    <div className="space-y-4">
      <div className="overflow-x-auto rounded-card border border-wool-200 bg-white">
        <table className="w-full text-left">
          <caption className="px-3 pt-3 text-left font-bold">{caption}</caption>
          <thead className="border-b-2 border-vat-800">
            <tr>
              <th scope="col" className="px-3 py-2">
                What
              </th>
              <th scope="col" className="px-3 py-2">
                Metric
              </th>
              <th scope="col" className="px-3 py-2">
                {systemNames[computed.system]}
              </th>
            </tr>
          </thead>
          <tbody className="divide-y divide-wool-200">
            {amounts.lines.map((line) => (
              <tr key={line.lineIndex}>
                <th scope="row" className="px-3 py-2 font-bold">
                  {line.name}
                  {line.approximate ? (
                    <span className="block text-sm font-normal text-vat-800">
                      Drops are approximate
                    </span>
                  ) : null}
                </th>
                <td className="px-3 py-2">
                  <MetricCell line={line} />
                </td>
                <td className="px-3 py-2">{kitchenLabel(line)}</td>
              </tr>
            ))}
            <tr>
              <th scope="row" className="px-3 py-2 font-bold">
                Water for the bath
              </th>
              <td className="px-3 py-2">{formatVolumeMl(amounts.bathVolumeMl)}</td>
              <td className="px-3 py-2">{amounts.water.label}</td>
            </tr>
            <tr>
              <th scope="row" className="px-3 py-2 font-bold">
                {acidName}
              </th>
              <td className="px-3 py-2">
                {formatAmount(amounts.acid.amountMl)} mL
                <span className="block text-sm text-vat-800">
                  {amounts.acid.source === 'recipe'
                    ? 'Your own amount, scaled'
                    : `Range ${formatAmount(acid.rangeMl.min)}–${formatAmount(acid.rangeMl.max)} mL`}
                </span>
              </td>
              <td className="px-3 py-2">{amounts.acid.household.label}</td>
            </tr>
          </tbody>
        </table>
      </div>
      <p className="text-sm text-vat-800">
        For {formatAmount(amounts.weightOfGoodsG)} g of dry fiber
        {amounts.skeins !== null
          ? ` (${amounts.skeins} skein${amounts.skeins === 1 ? '' : 's'})`
          : ''}
        . Acid rule: {acid.rule}
      </p>
      {amounts.batches.length > 1 ? (
        <p className="font-bold">
          Dye this in {amounts.batches.length} batches; each batch gets its own share of water, acid
          and dye.
        </p>
      ) : null}
      <WarningList warnings={computed.warnings} />
      <p className="rounded-xl border-2 border-madder-700 bg-madder-100 p-3 text-vat-950">
        <span className="font-bold">Not food. </span>
        {computed.safetyNote}
      </p>
    </div>
  );
}
