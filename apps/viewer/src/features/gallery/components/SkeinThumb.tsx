import type { GallerySkein } from '@vatside/contracts/gallery';
import { Link } from 'react-router-dom';

/** One square in the grid: the first photo, sized up front so nothing jumps as it loads. */
export function SkeinThumb({ skein, to }: { skein: GallerySkein; to: string }) {
  const photo = skein.photos[0];
  const name = `${skein.colorway?.name ?? 'Own colors'} by ${skein.makerName}`;
  return (
    <Link
      to={to}
      aria-label={skein.featured ? `${name} (featured)` : name}
      className="group block overflow-hidden rounded-xl border-2 border-wool-200 bg-white hover:border-vat-600"
    >
      {photo ? (
        <img
          src={photo.thumbUrl}
          width={photo.thumbWidth}
          height={photo.thumbHeight}
          loading="lazy"
          decoding="async"
          alt=""
          className="aspect-square h-auto w-full object-cover"
        />
      ) : (
        <span className="flex aspect-square items-center justify-center p-2 text-center text-sm">
          No photo
        </span>
      )}
      <span className="block truncate px-2 py-1 text-sm font-bold">
        {skein.featured ? <span aria-hidden="true">★ </span> : null}
        {skein.makerName}
      </span>
    </Link>
  );
}
