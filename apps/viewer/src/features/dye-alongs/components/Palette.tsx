import type { PublicDyeAlong } from '@vatside/contracts/dye-alongs';
import { Swatch } from '@vatside/ui/Swatch';

type Inspiration = NonNullable<PublicDyeAlong['inspiration']>;

const shareText = (share: number | null) =>
  share === null ? 'picked by the host' : `${Math.round(share * 100)} % of the image`;

/** The month's inspiration image and its palette: each color named, with its share. */
export function InspirationPalette({ inspiration }: { inspiration: Inspiration }) {
  return (
    <section aria-labelledby="palette-title" className="space-y-3">
      <img
        src={inspiration.webUrl}
        width={inspiration.width}
        height={inspiration.height}
        alt="The month’s inspiration image. Its main colors are listed below."
        className="h-auto w-full rounded-card border border-wool-200"
      />
      <h2 id="palette-title" className="font-display text-2xl font-semibold">
        The palette
      </h2>
      <ul className="grid gap-3 sm:grid-cols-2">
        {inspiration.palette.map((swatch) => (
          <li key={swatch.id} className="rounded-xl border border-wool-200 bg-white p-2">
            <Swatch hex={swatch.hex} label={swatch.label || swatch.name} />
            <span className="ml-13 block text-sm text-vat-800">{shareText(swatch.share)}</span>
          </li>
        ))}
      </ul>
    </section>
  );
}
