import type { Base } from '@vatside/contracts/workbench-bases';
import { colorwayCreateSchema, techniques } from '@vatside/contracts/workbench-colorways';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useForm } from 'react-hook-form';
import { useCreateColorway } from '../api.ts';
import { techniqueNames } from './names.ts';

/** Name it and pick the base; the recipe is written on the colorway's own page. */
export function NewColorwayForm({
  slug,
  bases,
  onCreated,
}: {
  slug: string;
  bases: Base[];
  onCreated: (colorwayId: string) => void;
}) {
  const create = useCreateColorway(slug);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(colorwayCreateSchema),
    defaultValues: { name: '', technique: 'immersion' as const, baseId: bases[0]?.id ?? null },
  });

  const onSubmit = handleSubmit(async (colorway) => {
    try {
      onCreated((await create.mutateAsync(colorway)).id);
    } catch (error) {
      showServerError(error, setError, ['name', 'technique', 'baseId', 'weightOfGoodsG']);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} aria-label="Start a colorway" className="space-y-4">
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="Colorway name" error={errors.name?.message} {...register('name')} />
        <SelectField label="Technique" error={errors.technique?.message} {...register('technique')}>
          {techniques.map((t) => (
            <option key={t} value={t}>
              {techniqueNames[t]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Base"
          error={errors.baseId?.message}
          {...register('baseId', { setValueAs: (v: string | null) => (v ? v : null) })}
        >
          <option value="">No base: I’ll give the skein weight</option>
          {bases.map((b) => (
            <option key={b.id} value={b.id}>
              {b.name}
            </option>
          ))}
        </SelectField>
        <TextField
          label="Dry weight of one skein (optional)"
          hint="Blank uses the base’s skein weight."
          type="number"
          inputMode="decimal"
          step="any"
          suffix="g"
          error={errors.weightOfGoodsG?.message}
          {...register('weightOfGoodsG', {
            setValueAs: (v: string | number | undefined) =>
              v === '' || v === undefined ? undefined : Number(v),
          })}
        />
      </div>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Starting…' : 'Start colorway'}
      </Button>
    </form>
  );
}
