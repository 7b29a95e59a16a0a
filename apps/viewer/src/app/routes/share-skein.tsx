import { useParams } from 'react-router-dom';
import { ShareSkeinScreen } from '../../features/sharing/components/ShareSkeinScreen.tsx';
import { MemberGate } from './member-gate.tsx';

/** /s/:slug/dye-alongs/:dyeAlongId/share: share a skein, for members of the studio. */
export function Component() {
  const { slug = '', dyeAlongId = '' } = useParams();
  return (
    <MemberGate slug={slug} why="share photos of your skeins">
      {() => <ShareSkeinScreen slug={slug} dyeAlongId={dyeAlongId} />}
    </MemberGate>
  );
}
