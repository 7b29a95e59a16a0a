import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { useSearchParams } from 'react-router-dom';
import { UnsubscribeScreen } from '../../features/unsubscribe/components/UnsubscribeScreen.tsx';

/** /unsubscribe?token=…, the page an e-mail's unsubscribe link opens. */
export function Component() {
  const [params] = useSearchParams();
  const token = params.get('token');
  if (!token) {
    return (
      <ErrorPanel
        title="This link is missing a part"
        error={{ message: 'Open the unsubscribe link from the e-mail again; it was cut short.' }}
      />
    );
  }
  return <UnsubscribeScreen token={token} />;
}
