import type { Submission } from '@vatside/contracts/submissions';
import { Swatch } from '@vatside/ui/Swatch';
import { bandWords } from '../status.ts';

/** How the yarn sits beside the month's inspiration: kind words in bands, never a score. */
export function ClosenessResult({ skein }: { skein: Submission }) {
  return (
    <section aria-labelledby={`closeness-${skein.id}`} className="space-y-3">
      <h3 id={`closeness-${skein.id}`} className="font-display text-2xl font-semibold">
        {skein.closeness ? bandWords[skein.closeness.band] : 'Your yarn’s colors'}
      </h3>
      <p className="text-lg">
        {skein.closeness
          ? skein.closeness.message
          : 'This month has no inspiration palette to compare with.'}
      </p>
      {skein.yarnPalette.length > 0 ? (
        <>
          <p className="font-bold">The main colors in the yarn area</p>
          <ul className="grid grid-cols-2 gap-2">
            {skein.yarnPalette.map((swatch) => (
              <li key={swatch.id} className="rounded-xl border border-wool-200 bg-white p-2">
                <Swatch hex={swatch.hex} label={swatch.label || swatch.name} />
              </li>
            ))}
          </ul>
        </>
      ) : null}
    </section>
  );
}
