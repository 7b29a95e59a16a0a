import type { RecipeLine } from '@vatside/contracts/workbench-colorways';
import type { LineAmount } from '@vatside/dye-kit';
import { WarningList } from '@vatside/ui/WarningList';
import { dropsWithYourDropper, type StepAmount } from '../utils/amounts.ts';
import { formatGrams, formatVolume } from '../utils/format.ts';
import type { Kit } from '../../../lib/kit.ts';

/** Below this a dropper is easier than a spoon, so the drop count is shown too. */
const showDropsBelowMl = 1;

type Said = { amount: string; what: string; details: string[] };

function say(line: LineAmount, source: RecipeLine | undefined, kit: Kit): Said {
  const details: string[] = [];
  const household = line.measurement.household;
  if (household && !household.tooSmallToMeasure) {
    details.push(`≈ ${household.label} (${kit.system === 'us' ? 'US' : 'metric'} spoons)`);
  }
  if (line.unit === 'drop' && line.volumeMl !== null) {
    return {
      amount: `${dropsWithYourDropper(line.volumeMl, kit)} drops`,
      what: line.name,
      details: [
        `About ${formatVolume(line.volumeMl)} with your dropper at ${kit.dropsPerMl} drops per mL; drops vary by bottle.`,
      ],
    };
  }
  if (line.unit === 'gGel') {
    return {
      amount: formatGrams(line.amount),
      what: `${line.name} gel`,
      details: ['Weigh it on a scale that reads 0.01 g.'],
    };
  }
  if (line.volumeMl !== null && line.volumeMl < showDropsBelowMl) {
    details.push(`≈ ${dropsWithYourDropper(line.volumeMl, kit)} drops with your dropper`);
  }
  const what =
    source?.kind === 'stock'
      ? `of ${line.name} stock at ${source.stockStrengthPct} %`
      : `of ${line.name}`;
  return { amount: formatVolume(line.amount), what, details };
}

/** The step's amount for the viewer's skein, in their units and with their dropper. */
export function StepAmountView({
  amount,
  source,
  kit,
}: {
  amount: StepAmount;
  source: RecipeLine | undefined;
  kit: Kit;
}) {
  const said = say(amount.line, source, kit);
  return (
    <div className="space-y-2 rounded-xl border-2 border-vat-600 bg-vat-100 px-4 py-3">
      <p className="text-sm font-bold tracking-wide text-vat-800 uppercase">
        For your {formatGrams(kit.skeinWeightG)} skein
      </p>
      <p className="leading-tight">
        <span className="text-4xl font-bold">{said.amount}</span>{' '}
        <span className="text-xl font-bold">{said.what}</span>
      </p>
      {said.details.map((detail) => (
        <p key={detail} className="text-lg">
          {detail}
        </p>
      ))}
      <WarningList warnings={amount.warnings} title="Measuring this" />
    </div>
  );
}
