import { paletteEditSchema, type Image } from '@vatside/contracts/workbench-images';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { Swatch } from '@vatside/ui/Swatch';
import { useState } from 'react';
import { useFieldArray, useForm } from 'react-hook-form';
import { useEditPalette } from '../api.ts';

/** Rename, reorder and drop swatches, then save the palette in one go. */
export function PaletteEditor({
  slug,
  image,
  canEdit,
}: {
  slug: string;
  image: Image;
  canEdit: boolean;
}) {
  const edit = useEditPalette(slug, image.id);
  const [saved, setSaved] = useState(false);
  const byId = new Map(image.palette.map((s) => [s.id, s]));
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting, isDirty },
  } = useForm({
    resolver: formResolver(paletteEditSchema),
    defaultValues: { swatches: image.palette.map((s) => ({ id: s.id, label: s.label })) },
  });
  const swatches = useFieldArray({ control, name: 'swatches', keyName: 'key' });

  const onSubmit = handleSubmit(async (palette) => {
    setSaved(false);
    try {
      const image = await edit.mutateAsync(palette);
      reset({ swatches: image.palette.map((s) => ({ id: s.id, label: s.label })) });
      setSaved(true);
    } catch (error) {
      showServerError(error, setError, ['swatches']);
    }
  });

  if (image.palette.length === 0) return <p>No swatches: pick a point on the image to add one.</p>;
  return (
    <form noValidate onSubmit={onSubmit} aria-label="Palette" className="space-y-3">
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <ol className="space-y-2">
        {swatches.fields.map((field, index) => {
          const swatch = byId.get(field.id);
          if (!swatch) return null;
          const n = index + 1;
          const shown = swatch.label || swatch.name;
          return (
            <li
              key={field.key}
              className="flex flex-wrap items-end gap-3 rounded-xl border border-wool-300 bg-white p-3"
            >
              <div className="w-56">
                <Swatch hex={swatch.hex} label={shown} showHex />
                <p className="mt-1 text-sm text-vat-800">
                  {swatch.share === null
                    ? 'Picked from a point'
                    : `${Math.round(swatch.share * 100)} % of the image`}
                  {swatch.label ? ` · reads as ${swatch.name}` : ''}
                </p>
              </div>
              {canEdit ? (
                <>
                  <TextField
                    label={`Name for swatch ${n}`}
                    placeholder={swatch.name}
                    className="min-w-48 flex-1"
                    error={errors.swatches?.[index]?.label?.message}
                    {...register(`swatches.${index}.label`)}
                  />
                  <div className="flex flex-wrap gap-2">
                    <Button
                      variant="secondary"
                      disabled={index === 0}
                      aria-label={`Move swatch ${n} earlier`}
                      onClick={() => swatches.move(index, index - 1)}
                    >
                      ↑
                    </Button>
                    <Button
                      variant="secondary"
                      disabled={index === swatches.fields.length - 1}
                      aria-label={`Move swatch ${n} later`}
                      onClick={() => swatches.move(index, index + 1)}
                    >
                      ↓
                    </Button>
                    <Button
                      variant="secondary"
                      aria-label={`Drop swatch ${n}`}
                      onClick={() => swatches.remove(index)}
                    >
                      Drop
                    </Button>
                  </div>
                </>
              ) : null}
            </li>
          );
        })}
      </ol>
      {canEdit ? (
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" disabled={isSubmitting || !isDirty}>
            {isSubmitting ? 'Saving…' : 'Save palette'}
          </Button>
          {saved && !isDirty ? <FormAlert tone="done">Palette saved.</FormAlert> : null}
        </div>
      ) : null}
    </form>
  );
}
