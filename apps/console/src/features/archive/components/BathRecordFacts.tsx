import type { ArchivedColorwayDetail } from '@vatside/contracts/archive';
import { celsiusToFahrenheit } from '@vatside/dye-kit';
import { formatMl, formatQuantity } from '@vatside/ui/supplies/format.ts';

type Record = ArchivedColorwayDetail['bathRecord'];

const orNot = (value: string | null) => value ?? 'not noted';

/** The bath as the host recorded it after the live session. */
export function BathRecordFacts({ record }: { record: Record }) {
  const facts: Array<[string, string]> = [
    [
      'Fiber dyed',
      record.fiberWeightDyedG === null
        ? `not weighed (plan: ${formatQuantity(record.plannedFiberWeightG)} g)`
        : `${formatQuantity(record.fiberWeightDyedG)} g`,
    ],
    [
      'Bath volume',
      record.bathVolumeMl === null
        ? `not measured (plan: ${formatMl(record.plannedBathVolumeMl)})`
        : formatMl(record.bathVolumeMl),
    ],
    [
      'Temperature reached',
      orNot(
        record.temperatureReachedC === null
          ? null
          : `${formatQuantity(record.temperatureReachedC)} °C (${formatQuantity(celsiusToFahrenheit(record.temperatureReachedC))} °F)`,
      ),
    ],
    [
      'Time at temperature',
      orNot(record.timeAtTemperatureMin === null ? null : `${record.timeAtTemperatureMin} min`),
    ],
    [
      'Bath exhausted',
      record.bathExhausted === null
        ? 'not noted'
        : record.bathExhausted
          ? 'yes, the water cleared'
          : 'no, color stayed in the water',
    ],
    ['Base lot', record.baseLot || 'not noted'],
    [
      'Dye lots',
      record.dyeLots.length
        ? record.dyeLots.map((d) => `${d.dyeName}: ${d.lot}`).join('; ')
        : 'not noted',
    ],
  ];
  return (
    <div className="space-y-3">
      <dl className="grid gap-x-6 gap-y-2 sm:grid-cols-[max-content_1fr]">
        {facts.map(([term, value]) => (
          <div key={term} className="contents">
            <dt className="font-bold">{term}</dt>
            <dd>{value}</dd>
          </div>
        ))}
      </dl>
      {record.notes ? (
        <p className="rounded-xl bg-wool-100 p-3">
          <span className="font-bold">Notes: </span>
          {record.notes}
        </p>
      ) : null}
    </div>
  );
}
