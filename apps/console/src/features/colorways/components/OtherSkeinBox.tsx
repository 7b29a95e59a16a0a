import { useQuery } from '@tanstack/react-query';
import { convert, type MeasureSystem } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { TextField } from '@vatside/ui/form/TextField';
import { useState } from 'react';
import { QueryView } from '../../../components/QueryView.tsx';
import { formatAmount } from '../../../lib/format.ts';
import { amountsQueryOptions } from '../api.ts';
import { AmountsView } from './AmountsView.tsx';

/** The recipe worked out by the server for any skein weight, e.g. a viewer’s 115 g skein. */
export function OtherSkeinBox({
  slug,
  colorwayId,
  system,
}: {
  slug: string;
  colorwayId: string;
  system: MeasureSystem;
}) {
  const [text, setText] = useState('115');
  const [weightG, setWeightG] = useState<number>();
  const [problem, setProblem] = useState<string>();
  const amounts = useQuery({
    ...amountsQueryOptions(slug, colorwayId, weightG ?? 0, system),
    enabled: weightG !== undefined,
  });
  const typed = Number(text);

  return (
    <div className="space-y-4">
      <form
        className="flex flex-wrap items-end gap-3"
        aria-label="Amounts for another skein"
        onSubmit={(event) => {
          event.preventDefault();
          if (!(typed > 0 && typed <= 50_000)) {
            setProblem('Give the dry weight in grams, more than 0.');
            return;
          }
          setProblem(undefined);
          setWeightG(typed);
        }}
      >
        <TextField
          label="Dry weight of the other skein"
          type="number"
          inputMode="decimal"
          step="any"
          className="w-64"
          suffix={typed > 0 ? `g ≈ ${formatAmount(convert(typed, 'g', 'oz'))} oz` : 'g'}
          value={text}
          error={problem}
          onChange={(event) => setText(event.target.value)}
        />
        <Button type="submit">Work out amounts</Button>
      </form>
      {weightG !== undefined ? (
        <QueryView
          query={amounts}
          loading="Working out the amounts…"
          failed="The amounts could not be worked out"
        >
          {(computed) => (
            <AmountsView
              computed={computed}
              caption={`Amounts for a ${formatAmount(weightG)} g skein`}
            />
          )}
        </QueryView>
      ) : null}
    </div>
  );
}
