import type { ArchivedLine } from '@vatside/contracts/archive';
import { formatQuantity } from '@vatside/ui/supplies/format.ts';

const unitWords = { mL: 'mL', drop: 'drops', gGel: 'g of gel' } as const;
const cell = 'border border-wool-300 px-3 py-2 text-left align-top';

const amount = (value: number | null, unit: ArchivedLine['unit']) =>
  value === null ? 'not logged' : `${formatQuantity(value)} ${unitWords[unit]}`;

const difference = (pct: number | null) =>
  pct === null
    ? '—'
    : pct === 0
      ? 'as planned'
      : `${pct > 0 ? '+' : '−'}${formatQuantity(Math.abs(pct))} %`;

const depth = (pct: number | null) => (pct === null ? '—' : `${formatQuantity(pct)} %`);

/** Each dye as planned beside what the dye log says went into the pot. */
export function PlanVsActual({ lines }: { lines: ArchivedLine[] }) {
  if (lines.length === 0) return <p>This colorway had no dye lines.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse">
        <caption className="sr-only">Planned and actual amount of each dye</caption>
        <thead>
          <tr className="bg-wool-100">
            <th scope="col" className={cell}>
              Dye
            </th>
            <th scope="col" className={cell}>
              Planned
            </th>
            <th scope="col" className={cell}>
              Actual (dye log)
            </th>
            <th scope="col" className={cell}>
              Difference
            </th>
            <th scope="col" className={cell}>
              Depth of shade planned → reached
            </th>
          </tr>
        </thead>
        <tbody>
          {lines.map((line) => (
            <tr key={line.recipeLineId}>
              <th scope="row" className={cell}>
                {line.name}
              </th>
              <td className={cell}>{amount(line.plannedAmount, line.unit)}</td>
              <td className={cell}>{amount(line.actualAmount, line.unit)}</td>
              <td className={cell}>{difference(line.differencePct)}</td>
              <td className={cell}>
                {line.kind === 'stock'
                  ? `${depth(line.plannedDepthOfShadePct)} → ${depth(line.actualDepthOfShadePct)}`
                  : 'food color (strength unknown)'}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
