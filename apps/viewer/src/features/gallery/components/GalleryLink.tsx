import { buttonClass } from '@vatside/ui/Button';
import { Link } from 'react-router-dom';
import { galleryPagePath } from '../api.ts';

/** From a dye-along's page to its gallery. */
export function GalleryLink({ slug, dyeAlongId }: { slug: string; dyeAlongId: string }) {
  return (
    <Link to={galleryPagePath(slug, dyeAlongId)} className={buttonClass('secondary', 'hand')}>
      See the month’s skeins
    </Link>
  );
}
