import type { Image } from '@vatside/contracts/workbench-images';
import { Button } from '@vatside/ui/Button';
import { TextField } from '@vatside/ui/form/TextField';
import { Swatch } from '@vatside/ui/Swatch';
import { useState } from 'react';
import { useFieldArray, useFormContext } from 'react-hook-form';
import type { ColorwayDraft } from './colorway-draft.ts';

/** The palette swatches this colorway aims at: from an inspiration image, or any color. */
export function TargetSwatches({ images, canEdit }: { images: Image[]; canEdit: boolean }) {
  const { control } = useFormContext<ColorwayDraft>();
  const swatches = useFieldArray({ control, name: 'targetSwatches' });
  const [hex, setHex] = useState('#2a6e80');
  const [name, setName] = useState('');
  const chosen = new Set(swatches.fields.map((s) => s.hex));

  return (
    <fieldset className="space-y-3">
      <legend className="font-bold">Aims at</legend>
      {swatches.fields.length === 0 ? (
        <p className="text-vat-800">No target colors yet.</p>
      ) : (
        <ul className="flex flex-wrap gap-3">
          {swatches.fields.map((s, i) => (
            <li
              key={s.id}
              className="flex items-center gap-2 rounded-xl border border-wool-300 bg-white p-2"
            >
              <Swatch hex={s.hex} label={s.name || s.hex} />
              {canEdit ? (
                <Button variant="secondary" onClick={() => swatches.remove(i)}>
                  Remove<span className="sr-only"> {s.name || s.hex}</span>
                </Button>
              ) : null}
            </li>
          ))}
        </ul>
      )}
      {canEdit ? (
        <>
          {images.map((image, n) =>
            image.palette.length === 0 ? null : (
              <div key={image.id} className="space-y-2">
                <p className="text-sm font-bold">From inspiration image {n + 1}</p>
                <div className="flex flex-wrap gap-2">
                  {image.palette.map((p) => {
                    const label = p.label || p.name;
                    return (
                      <button
                        key={p.id}
                        type="button"
                        disabled={chosen.has(p.hex)}
                        onClick={() => swatches.append({ hex: p.hex, name: label.slice(0, 60) })}
                        className="min-h-12 rounded-xl border-2 border-vat-800 bg-white px-2 disabled:opacity-50"
                      >
                        <Swatch hex={p.hex} label={label} />
                        <span className="sr-only">
                          {chosen.has(p.hex) ? ' (already chosen)' : ' (add)'}
                        </span>
                      </button>
                    );
                  })}
                </div>
              </div>
            ),
          )}
          <div className="flex flex-wrap items-end gap-3">
            <TextField
              label="Other color"
              type="color"
              className="w-40"
              value={hex}
              onChange={(e) => setHex(e.target.value)}
            />
            <TextField
              label="Its name"
              className="w-56"
              value={name}
              onChange={(e) => setName(e.target.value)}
            />
            <Button
              variant="secondary"
              onClick={() => {
                swatches.append({ hex, name: name.trim() });
                setName('');
              }}
            >
              Add color
            </Button>
          </div>
        </>
      ) : null}
    </fieldset>
  );
}
