import type { Dye, StockSolution } from '@vatside/contracts/workbench-shelf';
import { stockSolutionCreateSchema } from '@vatside/contracts/workbench-shelf';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useForm } from 'react-hook-form';
import { AddOrSaveButtons } from '../../../components/AddOrSaveButtons.tsx';
import { useFocusWhenChanging } from '../../../components/use-focus-when-changing.ts';
import { useCreateStockSolution, useUpdateStockSolution } from '../api.ts';

const today = () => new Date().toISOString().slice(0, 10);

/**
 * Record a jar just mixed: which dye, how strong, how much. With `editing`, the same form
 * corrects that jar in place (recipes keep pointing at it); what is left changes only by an
 * adjustment, so it is not here.
 */
export function StockSolutionForm({
  slug,
  dyes,
  editing,
  onDone,
}: {
  slug: string;
  dyes: Dye[];
  editing?: StockSolution;
  onDone?: () => void;
}) {
  const create = useCreateStockSolution(slug);
  const update = useUpdateStockSolution(slug);
  const blank = {
    dyeId: dyes[0]?.id ?? '',
    stockStrengthPct: 1,
    volumeMadeMl: 500,
    madeOn: today(),
  };
  const current = editing && {
    dyeId: editing.dyeId,
    stockStrengthPct: editing.stockStrengthPct,
    volumeMadeMl: editing.volumeMadeMl,
    madeOn: editing.madeOn,
  };
  const {
    register,
    handleSubmit,
    setError,
    reset,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(stockSolutionCreateSchema),
    defaultValues: current ?? blank,
  });
  useFocusWhenChanging(editing !== undefined, setFocus, 'dyeId');

  if (dyes.length === 0) {
    return <p>Add a dye to the shelf first; a stock solution is mixed from one.</p>;
  }

  const onSubmit = handleSubmit(async (stock) => {
    try {
      if (editing) {
        await update.mutateAsync({ id: editing.id, patch: stock });
        onDone?.();
        return;
      }
      await create.mutateAsync(stock);
      reset(blank);
    } catch (error) {
      showServerError(error, setError, ['dyeId', 'stockStrengthPct', 'volumeMadeMl', 'madeOn']);
    }
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={editing ? `Change the ${editing.dyeName} jar` : 'Add a stock solution'}
      className="space-y-4"
    >
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField label="Dye" error={errors.dyeId?.message} {...register('dyeId')}>
          {dyes.map((dye) => (
            <option key={dye.id} value={dye.id}>
              {dye.name}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Strength (% w/v)"
          hint="Grams of dye per 100 mL: 1 g in 100 mL is 1 %."
          type="number"
          inputMode="decimal"
          step="any"
          suffix="%"
          error={errors.stockStrengthPct?.message}
          {...register('stockStrengthPct', { valueAsNumber: true })}
        />
        <TextField
          label="Volume made"
          type="number"
          inputMode="decimal"
          step="any"
          suffix="mL"
          error={errors.volumeMadeMl?.message}
          {...register('volumeMadeMl', { valueAsNumber: true })}
        />
        <TextField
          label="Made on"
          type="date"
          error={errors.madeOn?.message}
          {...register('madeOn')}
        />
      </div>
      <AddOrSaveButtons
        addLabel="Add stock solution"
        changing={editing !== undefined}
        submitting={isSubmitting}
        onCancel={onDone}
      />
    </form>
  );
}
