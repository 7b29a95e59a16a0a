import { dyeCreateSchema, dyeKinds, type Dye } from '@vatside/contracts/workbench-shelf';
import { COLORANTS } from '@vatside/dye-kit';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { AddOrSaveButtons } from '../../../components/AddOrSaveButtons.tsx';
import { useFocusWhenChanging } from '../../../components/use-focus-when-changing.ts';
import { useForm } from 'react-hook-form';
import { useCreateDye, useUpdateDye } from '../api.ts';
import { dyeKindNames } from './kind-names.ts';

const blank = { kind: 'liquidFoodColor' as const, name: '', colorantIds: [], swatchHex: '#2a6e80' };

/**
 * Put a dye on the shelf: what it is, what is in it, and the color it gives. With `editing`, the
 * same form changes that dye in place (its stock jars and recipes keep pointing at it).
 */
export function DyeForm({
  slug,
  editing,
  onDone,
}: {
  slug: string;
  editing?: Dye;
  onDone?: () => void;
}) {
  const create = useCreateDye(slug);
  const update = useUpdateDye(slug);
  const {
    register,
    handleSubmit,
    setError,
    reset,
    watch,
    setFocus,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(dyeCreateSchema),
    defaultValues: editing
      ? {
          kind: editing.kind,
          name: editing.name,
          colorantIds: editing.colorantIds,
          swatchHex: editing.swatchHex,
        }
      : blank,
  });
  useFocusWhenChanging(editing !== undefined, setFocus, 'name');
  const hex = watch('swatchHex');

  const onSubmit = handleSubmit(async (dye) => {
    try {
      if (editing) {
        await update.mutateAsync({ id: editing.id, patch: dye });
        onDone?.();
        return;
      }
      await create.mutateAsync(dye);
      reset(blank);
    } catch (error) {
      showServerError(error, setError, ['kind', 'name', 'colorantIds', 'swatchHex']);
    }
  });

  return (
    <form
      noValidate
      onSubmit={onSubmit}
      aria-label={editing ? `Change ${editing.name}` : 'Add a dye'}
      className="space-y-4"
    >
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField
          label="Dye name"
          hint="As you call it, e.g. “sea glass teal”."
          error={errors.name?.message}
          {...register('name')}
        />
        <SelectField label="Kind" error={errors.kind?.message} {...register('kind')}>
          {dyeKinds.map((kind) => (
            <option key={kind} value={kind}>
              {dyeKindNames[kind]}
            </option>
          ))}
        </SelectField>
      </div>
      <fieldset className="space-y-2">
        <legend className="font-bold">Colorants on the label (if listed)</legend>
        <div className="grid gap-2 sm:grid-cols-2">
          {COLORANTS.map((colorant) => (
            <label
              key={colorant.id}
              className="flex min-h-12 items-center gap-3 rounded-xl border-2 border-wool-300 bg-white px-3"
            >
              <input
                type="checkbox"
                value={colorant.id}
                className="size-6 accent-vat-800"
                {...register('colorantIds')}
              />
              <span>
                {colorant.fdcName} <span className="text-vat-800">({colorant.euNumber})</span>
              </span>
            </label>
          ))}
        </div>
        {errors.colorantIds?.message ? (
          <p className="font-bold text-madder-700">{errors.colorantIds.message}</p>
        ) : null}
      </fieldset>
      <div className="flex flex-wrap items-end gap-4">
        <TextField
          label="Swatch color"
          hint="The color it dyes on white wool."
          type="color"
          className="w-48"
          suffix={hex}
          error={errors.swatchHex?.message}
          {...register('swatchHex')}
        />
        <AddOrSaveButtons
          addLabel="Add dye"
          changing={editing !== undefined}
          submitting={isSubmitting}
          onCancel={onDone}
        />
      </div>
    </form>
  );
}
