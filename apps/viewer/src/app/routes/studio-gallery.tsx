import { useParams } from 'react-router-dom';
import { GalleryScreen } from '../../features/gallery/components/GalleryScreen.tsx';

/** /s/:slug/dye-alongs/:dyeAlongId/gallery: the month's skeins, public. */
export function Component() {
  const { slug = '', dyeAlongId = '' } = useParams();
  return <GalleryScreen slug={slug} dyeAlongId={dyeAlongId} />;
}
