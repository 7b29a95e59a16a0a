import { useParams } from 'react-router-dom';
import { JoinInvitation } from '../../features/invitations/components/JoinInvitation.tsx';

export function Component() {
  const { token = '' } = useParams();
  return <JoinInvitation token={token} />;
}
