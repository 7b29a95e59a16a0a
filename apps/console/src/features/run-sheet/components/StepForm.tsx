import {
  cautionKinds,
  stepCreateSchema,
  type Step,
  type StepCreate,
} from '@vatside/contracts/workbench-colorways';
import { celsiusToFahrenheit } from '@vatside/dye-kit';
import { FieldFrame, fieldInputClass } from '@vatside/ui/form/FieldFrame';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useId } from 'react';
import { useForm, type Resolver } from 'react-hook-form';
import { AddOrSaveButtons } from '../../../components/AddOrSaveButtons.tsx';
import { useFocusWhenChanging } from '../../../components/use-focus-when-changing.ts';
import { formatAmount, formatTimer, parseTimer } from '../../../lib/format.ts';
import { useCreateStep, useUpdateStep } from '../api.ts';
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

/** A saved step as the form shows it: the timer in the min:sec the field is typed in. */
const valuesOf = (step: Step) => ({
  instruction: step.instruction,
  recipeLineId: step.recipeLineId,
  timerSeconds: step.timerSeconds === null ? null : formatTimer(step.timerSeconds),
  temperatureC: step.temperatureC,
  visualCue: step.visualCue,
  caution: step.caution,
});

// The timer field reads min:sec when typed in; a saved step's timer starts as that text too and
// stays text while untouched, so it is read the same way before the step is checked.
const asTyped = formResolver(stepCreateSchema);
const stepResolver: Resolver<StepCreate> = (values, context, options) =>
  asTyped(
    {
      ...values,
      timerSeconds:
        typeof values.timerSeconds === 'string'
          ? parseTimer(values.timerSeconds)
          : values.timerSeconds,
    },
    context,
    options,
  );

/**
 * A new step at the end of the run sheet. With `editing`, the same form changes that step in
 * place, and `onDone` closes it.
 */
export function StepForm({
  slug,
  colorwayId,
  lines,
  editing,
  onDone,
}: {
  slug: string;
  colorwayId: string;
  lines: LineChoice[];
  editing?: { step: Step; number: number };
  onDone?: () => void;
}) {
  const create = useCreateStep(slug, colorwayId);
  const update = useUpdateStep(slug, colorwayId);
  const cuesId = useId();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    watch,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm<StepCreate>({
    resolver: stepResolver,
    defaultValues: editing ? (valuesOf(editing.step) as StepCreate) : blank,
  });
  const temperatureC = watch('temperatureC');
  useFocusWhenChanging(editing !== undefined, setFocus, 'instruction');

  const onSubmit = handleSubmit(async (step) => {
    try {
      if (editing) {
        await update.mutateAsync({ id: editing.step.id, patch: step });
        onDone?.();
        return;
      }
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
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={editing ? `Change step ${editing.number}` : 'Add a step'}
      className="space-y-4"
    >
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
      <AddOrSaveButtons
        addLabel="Add step"
        changing={editing !== undefined}
        submitting={isSubmitting}
        onCancel={onDone}
      />
    </form>
  );
}
