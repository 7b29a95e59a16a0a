import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { MeasureSystem } from '@vatside/dye-kit';
import { cx } from '@vatside/ui/cx.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { PrepChecklistView } from '@vatside/ui/supplies/PrepChecklistView';
import { SupplyListView } from '@vatside/ui/supplies/SupplyListView';
import { useState } from 'react';
import { QueryView } from '../../../components/QueryView.tsx';
import { SystemSwitch } from '../../../components/SystemSwitch.tsx';
import { suppliesQueryOptions, type SupplyTarget } from '../api.ts';

type Scope = SupplyTarget['scope'];
const scopes: { value: Scope; label: string }[] = [
  { value: 'hostBatch', label: 'My batch' },
  { value: 'perSkein', label: 'One participant’s skein' },
];

const readWeight = (text: string) => {
  const grams = Number(text);
  return Number.isFinite(grams) && grams > 0 && grams <= 5_000 ? grams : null;
};

/** The supply list and prep checklist, for the host's batch or one participant's skein. */
export function SuppliesPanel({
  slug,
  dyeAlongId,
  initialSystem,
  initialWeightG,
}: {
  slug: string;
  dyeAlongId: string;
  initialSystem: MeasureSystem;
  initialWeightG: number;
}) {
  const [scope, setScope] = useState<Scope>('hostBatch');
  const [system, setSystem] = useState(initialSystem);
  const [weightText, setWeightText] = useState(String(initialWeightG));
  const weightG = readWeight(weightText);
  const target: SupplyTarget =
    scope === 'hostBatch' ? { scope } : { scope, weightOfGoodsG: weightG ?? initialWeightG };
  const supplies = useQuery({
    ...suppliesQueryOptions(slug, dyeAlongId, target, system),
    placeholderData: keepPreviousData,
  });

  return (
    <div className="space-y-6">
      <div className="flex flex-wrap items-end gap-4">
        <div
          role="group"
          aria-label="Whose amounts"
          className="inline-flex rounded-xl border-2 border-vat-800 p-1"
        >
          {scopes.map((choice) => (
            <button
              key={choice.value}
              type="button"
              aria-pressed={scope === choice.value}
              onClick={() => setScope(choice.value)}
              className={cx(
                'min-h-11 rounded-lg px-4 font-bold',
                scope === choice.value
                  ? 'bg-vat-800 text-wool-50'
                  : 'text-vat-900 hover:bg-vat-100',
              )}
            >
              {choice.label}
            </button>
          ))}
        </div>
        {scope === 'perSkein' ? (
          <TextField
            label="Participant’s skein weight"
            type="number"
            inputMode="decimal"
            min={1}
            max={5000}
            suffix="g"
            className="w-56"
            value={weightText}
            onChange={(event) => setWeightText(event.target.value)}
            error={weightG === null ? 'Give a weight between 1 and 5,000 g.' : undefined}
          />
        ) : null}
        <SystemSwitch system={system} onChange={setSystem} />
      </div>
      <QueryView
        query={supplies}
        loading="Adding up supplies…"
        failed="The supply list did not load"
      >
        {({ supplyList, prepChecklist }) => (
          <div className="grid items-start gap-8 xl:grid-cols-2">
            <section aria-labelledby="supplies-title" className="space-y-4">
              <h3 id="supplies-title" className="font-display text-2xl font-semibold">
                Supply list
                <span className="block text-base font-normal text-vat-800">
                  {supplyList.scope === 'hostBatch'
                    ? 'Everything for your skeins of every colorway.'
                    : `One ${supplyList.weightOfGoodsG ?? ''} g skein of each colorway.`}
                </span>
              </h3>
              <SupplyListView supplies={supplyList} level={4} />
            </section>
            <section aria-labelledby="prep-title" className="space-y-4">
              <h3 id="prep-title" className="font-display text-2xl font-semibold">
                Prep checklist
              </h3>
              <PrepChecklistView checklist={prepChecklist} level={4} />
            </section>
          </div>
        )}
      </QueryView>
    </div>
  );
}
