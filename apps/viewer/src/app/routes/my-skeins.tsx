import { useParams } from 'react-router-dom';
import { MySkeinsScreen } from '../../features/sharing/components/MySkeinsScreen.tsx';
import { MemberGate } from './member-gate.tsx';

/** /s/:slug/my-skeins: the skeins I have shared in this studio. */
export function Component() {
  const { slug = '' } = useParams();
  return (
    <MemberGate slug={slug} why="share photos of your skeins and keep track of them">
      {(studio) => <MySkeinsScreen slug={slug} studioName={studio.name} />}
    </MemberGate>
  );
}
