import { cautionKinds, stepCreateSchema } from '@vatside/contracts/workbench-colorways';
import { celsiusToFahrenheit } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { FieldFrame, fieldInputClass } from '@vatside/ui/form/FieldFrame';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { formatAmount, parseTimer } from '../../../lib/format.ts';
import { useCreateStep } from '../api.ts';
import { cautionNames, temperatureCues } from './names.ts';
import type { LineChoice } from './RunSheet.tsx';

const blank = {
  instruction: '',
  recipeLineId: null,
  timerSeconds: null,
  temperatureC: null,
  visualCue: null,
  caution: 'none' as const,
};
const orNull = (v: string | null) => (v === null || v.trim() === '' ? null : v);
const numberOrNull = (v: string | number | null) => (v === null || v === '' ? null : Number(v));

/** A new step at the end of the run sheet. */
export function StepForm({
  slug,
  colorwayId,
  lines,
}: {
  slug: string;
  colorwayId: string;
  lines: LineChoice[];
}) {
  const create = useCreateStep(slug, colorwayId);
  const cuesId = useId();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    watch,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: formResolver(stepCreateSchema), defaultValues: blank });
  const temperatureC = watch('temperatureC');

  const onSubmit = handleSubmit(async (step) => {
    try {
      await create.mutateAsync(step);
      reset(blank);
    } catch (error) {
      showServerError(error, setError, [
        'instruction',
        'recipeLineId',
        'timerSeconds',
        'temperatureC',
        'visualCue',
        'caution',
      ]);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Add a step" className="space-y-4">
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <FieldFrame label="What to do" error={errors.instruction?.message}>
        {(control) => (
          <textarea
            rows={2}
            className={`${fieldInputClass} py-2`}
            {...control}
            {...register('instruction')}
          />
        )}
      </FieldFrame>
      <div className="grid gap-4 sm:grid-cols-2">
        <SelectField
          label="Amount to measure (optional)"
          error={errors.recipeLineId?.message}
          {...register('recipeLineId', { setValueAs: orNull })}
        >
          <option value="">No amount</option>
          {lines.map((line) => (
            <option key={line.id} value={line.id}>
              {line.name}: {line.amount}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Timer (optional)"
          hint="Minutes:seconds, e.g. 30:00."
          inputMode="numeric"
          placeholder="min:sec"
          error={errors.timerSeconds?.message}
          {...register('timerSeconds', {
            setValueAs: (v: string | number | null) => (typeof v === 'string' ? parseTimer(v) : v),
          })}
        />
        <TextField
          label="Temperature (optional)"
          type="number"
          inputMode="decimal"
          step="any"
          suffix={
            typeof temperatureC === 'number' && Number.isFinite(temperatureC)
              ? `°C = ${formatAmount(celsiusToFahrenheit(temperatureC))} °F`
              : '°C'
          }
          error={errors.temperatureC?.message}
          {...register('temperatureC', { setValueAs: numberOrNull })}
        />
        <TextField
          label="What the bath looks like then"
          hint="For anyone without a thermometer."
          list={cuesId}
          error={errors.visualCue?.message}
          {...register('visualCue', { setValueAs: orNull })}
        />
        <datalist id={cuesId}>
          {temperatureCues.map((cue) => (
            <option key={cue} value={cue} />
          ))}
        </datalist>
        <SelectField label="Caution" error={errors.caution?.message} {...register('caution')}>
          {cautionKinds.map((kind) => (
            <option key={kind} value={kind}>
              {cautionNames[kind]}
            </option>
          ))}
        </SelectField>
      </div>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Adding…' : 'Add step'}
      </Button>
    </form>
  );
}
