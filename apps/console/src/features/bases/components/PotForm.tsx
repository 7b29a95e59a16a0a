import { potCreateSchema, potMaterials, type Pot } from '@vatside/contracts/workbench-bases';
import { convert } from '@vatside/dye-kit';
import { ApiError } from '@vatside/ui/api-client.ts';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { AddOrSaveButtons } from '../../../components/AddOrSaveButtons.tsx';
import { useFocusWhenChanging } from '../../../components/use-focus-when-changing.ts';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { useCreatePot, useUpdatePot } from '../api.ts';
import { capacityLabel } from './capacity.ts';
import { potMaterialNames } from './names.ts';

// Dyers size pots in liters; the API keeps mL. Same rules as the shared schema, 200 L at most.
const potFormSchema = potCreateSchema
  .omit({ capacityMl: true })
  .extend({ capacityL: z.number().positive().max(200) });
const blank = { name: '', capacityL: 8, material: 'stainlessSteel' as const };

/** A pot on the stove; with `editing`, the same form changes that pot in place. */
export function PotForm({
  slug,
  editing,
  onDone,
}: {
  slug: string;
  editing?: Pot;
  onDone?: () => void;
}) {
  const create = useCreatePot(slug);
  const update = useUpdatePot(slug);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    watch,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(potFormSchema),
    defaultValues: editing
      ? {
          name: editing.name,
          capacityL: convert(editing.capacityMl, 'mL', 'L'),
          material: editing.material,
        }
      : blank,
  });
  useFocusWhenChanging(editing !== undefined, setFocus, 'name');
  const capacityL = watch('capacityL');
  const material = watch('material');

  const onSubmit = handleSubmit(async ({ capacityL: liters, ...pot }) => {
    const values = { ...pot, capacityMl: convert(liters, 'L', 'mL') };
    try {
      if (editing) {
        await update.mutateAsync({ id: editing.id, patch: values });
        onDone?.();
        return;
      }
      await create.mutateAsync(values);
      reset(blank);
    } catch (error) {
      if (error instanceof ApiError && error.fields?.capacityMl) {
        setError('capacityL', { message: error.fields.capacityMl.join(' ') });
      }
      showServerError(error, setError, ['name', 'material']);
    }
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={editing ? `Change ${editing.name}` : 'Add a pot'}
      className="space-y-4"
    >
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <div className="grid gap-4 sm:grid-cols-3">
        <TextField
          label="Pot name"
          hint="e.g. “big canning pot”."
          error={errors.name?.message}
          {...register('name')}
        />
        <TextField
          label="Capacity (liters)"
          hint={
            Number.isFinite(capacityL) && capacityL > 0
              ? capacityLabel(convert(capacityL, 'L', 'mL'))
              : 'Filled to the brim.'
          }
          type="number"
          inputMode="decimal"
          step="any"
          suffix="L"
          error={errors.capacityL?.message}
          {...register('capacityL', { valueAsNumber: true })}
        />
        <SelectField label="Material" error={errors.material?.message} {...register('material')}>
          {potMaterials.map((m) => (
            <option key={m} value={m}>
              {potMaterialNames[m]}
            </option>
          ))}
        </SelectField>
      </div>
      {material === 'aluminum' ? (
        <FormAlert>
          Aluminum reacts with the acid in a dye bath and can dull colors. Stainless steel or enamel
          is the usual choice.
        </FormAlert>
      ) : null}
      <AddOrSaveButtons
        addLabel="Add pot"
        changing={editing !== undefined}
        submitting={isSubmitting}
        onCancel={onDone}
      />
    </form>
  );
}
