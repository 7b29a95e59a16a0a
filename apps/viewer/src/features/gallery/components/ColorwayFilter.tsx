import type { GalleryColorway } from '@vatside/contracts/gallery';
import { cx } from '@vatside/ui/cx.ts';

const chip = (on: boolean) =>
  cx(
    'min-h-12 rounded-full border-2 px-4 font-bold',
    on ? 'border-vat-800 bg-vat-800 text-wool-50' : 'border-vat-800 bg-wool-50 text-vat-900',
  );

/** Narrows the grid to one of the month's colorways (or shows them all). */
export function ColorwayFilter({
  colorways,
  chosen,
  onChoose,
}: {
  colorways: GalleryColorway[];
  chosen: string | null;
  onChoose: (colorwayId: string | null) => void;
}) {
  if (colorways.length === 0) return null;
  return (
    <div role="group" aria-label="Show colorway" className="flex flex-wrap gap-2">
      <button
        type="button"
        aria-pressed={chosen === null}
        className={chip(chosen === null)}
        onClick={() => onChoose(null)}
      >
        All colorways
      </button>
      {colorways.map((c) => (
        <button
          key={c.id}
          type="button"
          aria-pressed={chosen === c.id}
          className={chip(chosen === c.id)}
          onClick={() => onChoose(c.id)}
        >
          {c.name}
        </button>
      ))}
    </div>
  );
}
