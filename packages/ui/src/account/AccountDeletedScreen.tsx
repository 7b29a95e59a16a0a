import { Link } from 'react-router-dom';
import { buttonClass } from '../Button.tsx';
import { AccountFrame } from './AccountFrame.tsx';

export function AccountDeletedScreen() {
  return (
    <AccountFrame title="Your account is deleted">
      <p className="text-lg">
        Your profile and sign-in are gone. Thank you for dyeing along. You are welcome back any
        time.
      </p>
      <Link to="/" className={buttonClass('primary', 'hand')}>
        Back to the start
      </Link>
    </AccountFrame>
  );
}
