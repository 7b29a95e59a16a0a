import { Link, useSearchParams } from 'react-router-dom';
import { buttonClass } from '../Button.tsx';
import { textLinkClass } from '../link-class.ts';
import { useMe } from '../session.ts';
import { AccountFrame } from './AccountFrame.tsx';
import { safeNext, withNext } from './next-path.ts';

/** Where the confirmation link lands; better-auth adds `?error=` when the link is spent. */
export function AddressConfirmedScreen() {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const { data: me } = useMe();

  if (params.get('error')) {
    return (
      <AccountFrame title="That link has run dry">
        <p className="text-lg">
          The confirmation link is too old or was used already. Sign in with your address and we
          will offer to send a fresh one.
        </p>
        <Link to={withNext('/sign-in', next)} className={buttonClass('primary', 'hand')}>
          Go to sign in
        </Link>
      </AccountFrame>
    );
  }

  return (
    <AccountFrame title="Address confirmed">
      <p className="text-lg">
        {me ? `You are signed in as ${me.profile.name}.` : 'Your address is confirmed.'} Welcome to
        Vatside.
      </p>
      <Link to={next ?? '/'} className={buttonClass('primary', 'hand')}>
        {next ? 'Continue where you left off' : 'Start here'}
      </Link>
      <Link to="/profile" className={textLinkClass}>
        Set your units and skein weight
      </Link>
    </AccountFrame>
  );
}
