import type { SubmissionPhoto } from '@vatside/contracts/submissions';

const pct = (fraction: number) => `${(fraction * 100).toFixed(2)}%`;

/** One photo with the yarn area the maker marked drawn over it. */
export function SkeinPhoto({ photo, alt }: { photo: SubmissionPhoto; alt: string }) {
  const crop = photo.yarnCrop;
  const whole = crop.x === 0 && crop.y === 0 && crop.width === 1 && crop.height === 1;
  return (
    <figure className="w-40 shrink-0 space-y-1 sm:w-48">
      <a
        href={photo.webUrl}
        target="_blank"
        rel="noreferrer"
        className="relative block overflow-hidden rounded-lg border border-wool-300 bg-wool-100"
      >
        <img
          src={photo.thumbUrl}
          alt={alt}
          width={photo.thumbWidth}
          height={photo.thumbHeight}
          className="block h-auto w-full"
        />
        {whole ? null : (
          <span
            aria-hidden="true"
            data-testid="yarn-area"
            className="absolute rounded-sm border-2 border-dashed border-marigold-300 outline-2 outline-vat-950"
            style={{
              left: pct(crop.x),
              top: pct(crop.y),
              width: pct(crop.width),
              height: pct(crop.height),
            }}
          />
        )}
      </a>
      <figcaption className="text-sm text-vat-800">
        {whole ? 'Yarn: the whole photo' : 'Yarn area outlined'}
      </figcaption>
    </figure>
  );
}
