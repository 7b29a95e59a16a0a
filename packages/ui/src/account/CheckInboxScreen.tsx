import { Link, useSearchParams } from 'react-router-dom';
import { textLinkClass } from '../link-class.ts';
import { AccountFrame } from './AccountFrame.tsx';
import { safeNext, withNext } from './next-path.ts';
import { ResendLink } from './ResendLink.tsx';

/** After sign-up: the account waits until its address is confirmed. */
export function CheckInboxScreen() {
  const [params] = useSearchParams();
  const email = params.get('email') ?? '';
  const next = safeNext(params.get('next'));
  return (
    <AccountFrame title="A link is on its way">
      <p className="text-lg">
        We sent a confirmation link to <strong>{email || 'your address'}</strong>. Open it on this
        device to finish: it signs you in and brings you back here.
      </p>
      <p>No mail after a few minutes? Look in the spam folder, or ask for a new link.</p>
      {email ? <ResendLink email={email} next={next} /> : null}
      <Link to={withNext('/sign-in', next)} className={textLinkClass}>
        Back to sign in
      </Link>
    </AccountFrame>
  );
}
