import type { Dye, StockSolution } from '@vatside/contracts/workbench-shelf';
import { Button } from '@vatside/ui/Button';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import { useFormContext, useWatch } from 'react-hook-form';
import { formatPct } from '../../../lib/format.ts';
import type { ColorwayDraft } from './colorway-draft.ts';
import { foodUnitNames } from './names.ts';

/** One recipe line: a stock solution at a depth of shade, or food color per 100 g. */
export function RecipeLineFields({
  index,
  stocks,
  dyes,
  canEdit,
  onRemove,
}: {
  index: number;
  stocks: StockSolution[];
  dyes: Dye[];
  canEdit: boolean;
  onRemove: () => void;
}) {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<ColorwayDraft>();
  const path = `recipeLines.${index}` as const;
  const line = useWatch({ control, name: path });
  const problems = errors.recipeLines?.[index];
  const n = index + 1;

  return (
    <fieldset className="space-y-3 rounded-xl border-2 border-wool-300 bg-white p-4">
      <legend className="px-1 font-bold">Line {n}</legend>
      <div className="grid gap-3 sm:grid-cols-2">
        <SelectField label="Kind" {...register(`${path}.kind`)}>
          <option value="stock">Stock at a depth of shade</option>
          <option value="foodColor">Food color per 100 g</option>
        </SelectField>
        {line.kind === 'stock' ? (
          <SelectField
            label="Stock solution"
            error={problems?.stockSolutionId?.message}
            {...register(`${path}.stockSolutionId`)}
          >
            <option value="">Not on the shelf: type it in</option>
            {stocks.map((s) => (
              <option key={s.id} value={s.id}>
                {s.dyeName} · {formatPct(s.stockStrengthPct)}
              </option>
            ))}
          </SelectField>
        ) : (
          <SelectField
            label="Dye from the shelf"
            error={problems?.dyeId?.message}
            {...register(`${path}.dyeId`)}
          >
            <option value="">Not on the shelf: type it in</option>
            {dyes.map((d) => (
              <option key={d.id} value={d.id}>
                {d.name}
              </option>
            ))}
          </SelectField>
        )}
      </div>
      {line.kind === 'stock' ? (
        <div className="flex flex-wrap items-end gap-3">
          {line.stockSolutionId === '' ? (
            <>
              <TextField
                label="Dye name"
                className="min-w-48 flex-1"
                error={problems?.dyeName?.message}
                {...register(`${path}.dyeName`)}
              />
              <TextField
                label="Stock strength"
                className="w-44"
                type="number"
                inputMode="decimal"
                step="any"
                suffix="% w/v"
                error={problems?.stockStrengthPct?.message}
                {...register(`${path}.stockStrengthPct`)}
              />
            </>
          ) : null}
          <TextField
            label="Depth of shade"
            className="w-44"
            hint="% of dry fiber weight."
            type="number"
            inputMode="decimal"
            step="any"
            suffix="%"
            error={problems?.depthOfShadePct?.message}
            {...register(`${path}.depthOfShadePct`)}
          />
        </div>
      ) : (
        <div className="flex flex-wrap items-end gap-3">
          {line.dyeId === '' ? (
            <TextField
              label="Color name"
              className="min-w-48 flex-1"
              error={problems?.colorName?.message}
              {...register(`${path}.colorName`)}
            />
          ) : null}
          <TextField
            label="Amount per 100 g"
            className="w-44"
            type="number"
            inputMode="decimal"
            step="any"
            error={problems?.amountPer100g?.message}
            {...register(`${path}.amountPer100g`)}
          />
          <SelectField label="Measured in" className="w-44" {...register(`${path}.unit`)}>
            {Object.entries(foodUnitNames).map(([unit, name]) => (
              <option key={unit} value={unit}>
                {name}
              </option>
            ))}
          </SelectField>
        </div>
      )}
      {canEdit ? (
        <div className="flex justify-end">
          <Button variant="secondary" onClick={onRemove}>
            Remove line {n}
          </Button>
        </div>
      ) : null}
    </fieldset>
  );
}
