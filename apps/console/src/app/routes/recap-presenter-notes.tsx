import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { useParams } from 'react-router-dom';
import { RecapLoader } from './recap-presenter.tsx';

/** The presenter's notes, in a second window the recording leaves out. */
export function Component() {
  const { slug = '', dyeAlongId = '' } = useParams();
  return (
    <RequireSignIn>
      <RecapLoader slug={slug} dyeAlongId={dyeAlongId} notes />
    </RequireSignIn>
  );
}
