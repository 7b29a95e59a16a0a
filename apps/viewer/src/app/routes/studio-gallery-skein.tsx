import { useParams } from 'react-router-dom';
import { SkeinDetail } from '../../features/gallery/components/SkeinDetail.tsx';

/** /s/:slug/dye-alongs/:dyeAlongId/gallery/:skeinId: one shared skein, to pass around. */
export function Component() {
  const { slug = '', dyeAlongId = '', skeinId = '' } = useParams();
  return <SkeinDetail slug={slug} dyeAlongId={dyeAlongId} skeinId={skeinId} />;
}
