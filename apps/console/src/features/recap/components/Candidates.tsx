import type { GalleryColorway, GallerySkein } from '@vatside/contracts/gallery';
import { Button } from '@vatside/ui/Button';
import { Swatch } from '@vatside/ui/Swatch';

/** What may still go into the recap: featured skeins whose makers agreed, and the colorways. */
export function Candidates({
  skeins,
  colorways,
  onAddSkein,
  onAddColorway,
}: {
  skeins: GallerySkein[];
  colorways: GalleryColorway[];
  onAddSkein: (skein: GallerySkein) => void;
  onAddColorway: (colorway: GalleryColorway) => void;
}) {
  return (
    <section aria-labelledby="candidates-title" className="min-w-0 space-y-4">
      <h3 id="candidates-title" className="font-display text-2xl font-semibold">
        To add
      </h3>
      <div className="space-y-2">
        <h4 className="text-lg font-bold">Featured skeins</h4>
        <p className="text-vat-800">
          Only skeins you featured in the review, and whose makers agreed to be featured, can go in.
          A maker can take that back at any time; their skein then leaves the recap by itself.
        </p>
        {skeins.length === 0 ? (
          <p>No featured skeins left to add.</p>
        ) : (
          <ul aria-label="Featured skeins to add" className="space-y-2">
            {skeins.map((skein) => {
              const photo = skein.photos[0];
              const name = `${skein.colorway?.name ?? 'Own colors'} by ${skein.makerName}`;
              return (
                <li key={skein.id} className="flex items-center gap-3 rounded-xl bg-white p-2">
                  {photo ? (
                    <img
                      src={photo.thumbUrl}
                      width={photo.thumbWidth}
                      height={photo.thumbHeight}
                      loading="lazy"
                      alt=""
                      className="size-14 shrink-0 rounded-lg object-cover"
                    />
                  ) : null}
                  <span className="min-w-0 flex-1 font-bold">{name}</span>
                  <Button
                    variant="secondary"
                    aria-label={`Add ${name}`}
                    onClick={() => onAddSkein(skein)}
                  >
                    Add
                  </Button>
                </li>
              );
            })}
          </ul>
        )}
      </div>
      <div className="space-y-2">
        <h4 className="text-lg font-bold">The month’s colorways</h4>
        {colorways.length === 0 ? (
          <p>Every colorway of the month is in the running order.</p>
        ) : (
          <ul aria-label="Colorways to add" className="space-y-2">
            {colorways.map((colorway) => (
              <li key={colorway.id} className="flex items-center gap-3 rounded-xl bg-white p-2">
                {colorway.swatches[0] ? (
                  <Swatch
                    hex={colorway.swatches[0].hex}
                    label={colorway.name}
                    className="min-w-0 flex-1"
                  />
                ) : (
                  <span className="min-w-0 flex-1 font-bold">{colorway.name}</span>
                )}
                <Button
                  variant="secondary"
                  aria-label={`Add ${colorway.name}`}
                  onClick={() => onAddColorway(colorway)}
                >
                  Add
                </Button>
              </li>
            ))}
          </ul>
        )}
      </div>
    </section>
  );
}
