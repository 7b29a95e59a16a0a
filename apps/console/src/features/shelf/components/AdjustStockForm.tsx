import {
  stockAdjustmentCreateSchema,
  type StockSolution,
} from '@vatside/contracts/workbench-shelf';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useForm } from 'react-hook-form';
import { useAdjustStock } from '../api.ts';

/** Set what is really left in the jar, and say why (spilled, used off the plan, re-measured). */
export function AdjustStockForm({
  slug,
  stock,
  onDone,
}: {
  slug: string;
  stock: StockSolution;
  onDone: () => void;
}) {
  const adjust = useAdjustStock(slug, stock.id);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(stockAdjustmentCreateSchema),
    defaultValues: { volumeLeftMl: stock.volumeLeftMl, reason: '' },
  });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await adjust.mutateAsync(values);
      onDone();
    } catch (error) {
      showServerError(error, setError, ['volumeLeftMl', 'reason']);
    }
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={`Adjust what is left of ${stock.dyeName}`}
      className="space-y-3"
    >
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <div className="grid gap-3 sm:grid-cols-2">
        <TextField
          label="Left in the jar now"
          type="number"
          inputMode="decimal"
          step="any"
          suffix="mL"
          error={errors.volumeLeftMl?.message}
          {...register('volumeLeftMl', { valueAsNumber: true })}
        />
        <TextField
          label="Reason"
          hint="e.g. “used 40 mL in a test skein”."
          error={errors.reason?.message}
          {...register('reason')}
        />
      </div>
      <div className="flex flex-wrap gap-2">
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : 'Save what’s left'}
        </Button>
        <Button variant="secondary" onClick={onDone}>
          Cancel
        </Button>
      </div>
    </form>
  );
}
