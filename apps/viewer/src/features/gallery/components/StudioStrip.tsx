import type { GalleryColorway } from '@vatside/contracts/gallery';
import { Swatch } from '@vatside/ui/Swatch';

/** The host's own finished colorways, shown beside the community's skeins. */
export function StudioStrip({ colorways }: { colorways: GalleryColorway[] }) {
  if (colorways.length === 0) return null;
  return (
    <section aria-labelledby="studio-strip-title" className="space-y-3">
      <h2 id="studio-strip-title" className="font-display text-2xl font-semibold">
        From the studio
      </h2>
      {/* Scrolls sideways: focusable, so arrow keys scroll it too (WCAG 2.1.1). */}
      <ul
        tabIndex={0}
        aria-label="The studio’s colorways, side by side"
        className="-mx-4 flex snap-x scroll-px-4 gap-3 overflow-x-auto px-4 pb-2 focus-visible:outline-3 focus-visible:outline-vat-700"
      >
        {colorways.map((colorway) => (
          <li
            key={colorway.id}
            aria-label={colorway.name}
            className="w-64 shrink-0 snap-start space-y-2 rounded-card border border-wool-200 bg-wool-50 p-3"
          >
            {colorway.photo ? (
              <img
                src={colorway.photo.thumbUrl}
                width={colorway.photo.thumbWidth}
                height={colorway.photo.thumbHeight}
                loading="lazy"
                decoding="async"
                alt={`The host’s skein of ${colorway.name}`}
                className="aspect-[4/3] h-auto w-full rounded-lg object-cover"
              />
            ) : null}
            <h3 className="text-lg font-bold">{colorway.name}</h3>
            {colorway.swatches.length > 0 ? (
              <ul aria-label={`Colors of ${colorway.name}`} className="space-y-1">
                {colorway.swatches.map((swatch) => (
                  <li key={`${swatch.hex}-${swatch.name}`}>
                    <Swatch hex={swatch.hex} label={swatch.name} />
                  </li>
                ))}
              </ul>
            ) : null}
          </li>
        ))}
      </ul>
    </section>
  );
}
