import { baseCreateSchema, type Base } from '@vatside/contracts/workbench-bases';
import { convert, FIBER_NAMES } from '@vatside/dye-kit';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { WarningList } from '@vatside/ui/WarningList';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { AddOrSaveButtons } from '../../../components/AddOrSaveButtons.tsx';
import { useFocusWhenChanging } from '../../../components/use-focus-when-changing.ts';
import { formatAmount } from '../../../lib/format.ts';
import { useCreateBase, useUpdateBase } from '../api.ts';
import { fiberNames, weightClassNames } from './names.ts';

const blank = () => ({
  name: '',
  fiberContent: [{ fiber: 'wool' as const, pct: 100 }],
  superwash: true,
  weightClass: 1,
  skeinWeightG: 100,
  skeinLengthM: 400,
  lot: '',
});

const valuesOf = (base: Base) => ({
  name: base.name,
  fiberContent: base.fiberContent,
  superwash: base.superwash,
  weightClass: base.weightClass,
  skeinWeightG: base.skeinWeightG,
  skeinLengthM: base.skeinLengthM,
  lot: base.lot,
});

/**
 * A yarn base: what it is made of and what one skein weighs; the server runs the fiber check.
 * With `editing`, the same form changes that base in place (recipes keep pointing at it).
 */
export function BaseForm({
  slug,
  editing,
  onDone,
}: {
  slug: string;
  editing?: Base;
  onDone?: () => void;
}) {
  const create = useCreateBase(slug);
  const update = useUpdateBase(slug);
  const [created, setCreated] = useState<Base>();
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    watch,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(baseCreateSchema),
    defaultValues: editing ? valuesOf(editing) : blank(),
  });
  useFocusWhenChanging(editing !== undefined, setFocus, 'name');
  const fibers = useFieldArray({ control, name: 'fiberContent' });
  const lengthM = watch('skeinLengthM');

  const onSubmit = handleSubmit(async (base) => {
    setCreated(undefined);
    try {
      if (editing) {
        await update.mutateAsync({ id: editing.id, patch: base });
        onDone?.();
        return;
      }
      setCreated(await create.mutateAsync(base));
      reset(blank());
    } catch (error) {
      showServerError(error, setError, [
        'name',
        'fiberContent',
        'superwash',
        'weightClass',
        'skeinWeightG',
        'skeinLengthM',
        'lot',
      ]);
    }
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={editing ? `Change ${editing.name}` : 'Add a base'}
      className="space-y-4"
    >
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      {created ? (
        <div className="space-y-2">
          <FormAlert tone="done">
            {created.name} added: {formatAmount(created.fiberCheck.takesDyePct)} % of it takes acid
            dye and food color.
          </FormAlert>
          <WarningList
            warnings={created.fiberCheck.warnings}
            title={`Fiber check for ${created.name}`}
          />
        </div>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Base name"
          hint="e.g. “Merino sock, 4 ply”."
          error={errors.name?.message}
          {...register('name')}
        />
        <TextField
          label="Lot"
          hint="From the mill’s label, if any."
          error={errors.lot?.message}
          {...register('lot')}
        />
      </div>
      <fieldset className="space-y-3">
        <legend className="font-bold">Fiber content (adds up to 100 %)</legend>
        {fibers.fields.map((field, index) => (
          <div key={field.id} className="flex flex-wrap items-end gap-3">
            <SelectField
              label={`Fiber ${index + 1}`}
              className="w-52"
              error={errors.fiberContent?.[index]?.fiber?.message}
              {...register(`fiberContent.${index}.fiber`)}
            >
              {FIBER_NAMES.map((fiber) => (
                <option key={fiber} value={fiber}>
                  {fiberNames[fiber]}
                </option>
              ))}
            </SelectField>
            <TextField
              label={`Share of fiber ${index + 1}`}
              type="number"
              inputMode="decimal"
              step="any"
              suffix="%"
              className="w-40"
              error={errors.fiberContent?.[index]?.pct?.message}
              {...register(`fiberContent.${index}.pct`, { valueAsNumber: true })}
            />
            {fibers.fields.length > 1 ? (
              <Button variant="secondary" onClick={() => fibers.remove(index)}>
                Remove<span className="sr-only"> fiber {index + 1}</span>
              </Button>
            ) : null}
          </div>
        ))}
        {errors.fiberContent?.message || errors.fiberContent?.root?.message ? (
          <p className="font-bold text-madder-700">
            {errors.fiberContent.message ?? errors.fiberContent.root?.message}
          </p>
        ) : null}
        <Button variant="secondary" onClick={() => fibers.append({ fiber: 'nylon', pct: 0 })}>
          Add a fiber
        </Button>
      </fieldset>
      <label className="flex min-h-12 items-center gap-3 font-bold">
        <input type="checkbox" className="size-6 accent-vat-800" {...register('superwash')} />
        Superwash
      </label>
      <div className="grid gap-4 sm:grid-cols-3">
        <SelectField
          label="Weight class"
          hint="Craft Yarn Council categories."
          error={errors.weightClass?.message}
          {...register('weightClass', { valueAsNumber: true })}
        >
          {weightClassNames.map((name, n) => (
            <option key={name} value={n}>
              {n} · {name}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Skein weight (dry)"
          type="number"
          inputMode="decimal"
          step="any"
          suffix="g"
          error={errors.skeinWeightG?.message}
          {...register('skeinWeightG', { valueAsNumber: true })}
        />
        <TextField
          label="Skein length"
          type="number"
          inputMode="decimal"
          step="any"
          suffix={
            typeof lengthM === 'number' && lengthM > 0
              ? `m ≈ ${formatAmount(convert(lengthM, 'm', 'yd'))} yd`
              : 'm'
          }
          error={errors.skeinLengthM?.message}
          {...register('skeinLengthM', { valueAsNumber: true })}
        />
      </div>
      <AddOrSaveButtons
        addLabel="Add base"
        changing={editing !== undefined}
        submitting={isSubmitting}
        onCancel={onDone}
      />
    </form>
  );
}
