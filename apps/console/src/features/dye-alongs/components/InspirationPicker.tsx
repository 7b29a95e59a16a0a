import type { Swatch } from '@vatside/contracts/workbench-images';
import { cx } from '@vatside/ui/cx.ts';
import { useController, type Control } from 'react-hook-form';
import type { DyeAlongFormValues } from '../form-values.ts';

export type ImageChoice = { id: string; thumbUrl: string; palette: Swatch[] };

const swatchName = (s: Swatch) => s.label || s.name;

const optionClass =
  'flex cursor-pointer flex-col gap-2 rounded-xl border-2 border-vat-800 bg-white p-2 has-checked:border-4 has-checked:bg-vat-100 has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-vat-700';

/** One of the studio's inspiration images, chosen by its thumbnail and named by its palette. */
export function InspirationPicker({
  control,
  choices,
}: {
  control: Control<DyeAlongFormValues>;
  choices: ImageChoice[];
}) {
  const { field } = useController({ control, name: 'inspirationImageId' });
  const radio = (value: string) => ({
    type: 'radio' as const,
    name: field.name,
    value,
    checked: field.value === value,
    onChange: () => field.onChange(value),
    className: 'size-5 accent-vat-800',
  });
  return (
    <fieldset className="space-y-3">
      <legend className="text-xl font-bold">Inspiration image</legend>
      <div className="grid grid-cols-2 gap-3 sm:grid-cols-3 lg:grid-cols-4">
        <label className={cx(optionClass, 'justify-center')}>
          <span className="flex items-center gap-2 font-bold">
            <input {...radio('')} />
            No image
          </span>
        </label>
        {choices.map((image, i) => {
          const names = image.palette.slice(0, 4).map(swatchName).join(', ');
          return (
            <label key={image.id} className={optionClass}>
              <img
                src={image.thumbUrl}
                alt=""
                className="aspect-[4/3] w-full rounded-lg object-cover"
                loading="lazy"
              />
              <span className="flex items-start gap-2">
                <input {...radio(image.id)} />
                <span>
                  <span className="block font-bold">Image {i + 1}</span>
                  <span className="block text-sm text-vat-800">{names || 'No palette yet'}</span>
                </span>
              </span>
            </label>
          );
        })}
      </div>
      {choices.length === 0 ? <p>Upload one on the Inspiration screen to pick it here.</p> : null}
    </fieldset>
  );
}
