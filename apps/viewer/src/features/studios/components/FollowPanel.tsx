import type { StudioDetail } from '@vatside/contracts/studios';
import { withNext } from '@vatside/ui/account/next-path.ts';
import { Button, buttonClass } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { useMe } from '@vatside/ui/session.ts';
import { useState } from 'react';
import { Link } from 'react-router-dom';
import { useFollow, useUnfollow } from '../api.ts';
import { MailSwitch } from './MailSwitch.tsx';

const standingWords = {
  host: 'You host this studio.',
  moderator: 'You help moderate this studio.',
  viewer: 'You follow this studio.',
} as const;

/** Follow or unfollow with one big press, and choose whether the studio may e-mail. */
export function FollowPanel({ studio }: { studio: StudioDetail }) {
  const { data: me, isPending } = useMe();
  const follow = useFollow(studio.slug);
  const unfollow = useUnfollow(studio.slug);
  // Before following, the choice is only on this screen; it is sent with the follow.
  const [wantsMail, setWantsMail] = useState(false);
  const failure = follow.error ?? unfollow.error;

  if (isPending) return null;
  if (!me) {
    return (
      <Card as="section" aria-label="Follow" className="space-y-3">
        <p className="text-lg">Follow to hear when the next dye-along is set.</p>
        <Link
          to={withNext('/sign-in', `/s/${studio.slug}`)}
          className={buttonClass('primary', 'hand')}
        >
          Sign in to follow
        </Link>
        <Link to={withNext('/sign-up', `/s/${studio.slug}`)} className={textLinkClass}>
          New here? Create an account
        </Link>
      </Card>
    );
  }

  const role = studio.myRole;
  const mailSwitch = (
    <MailSwitch
      checked={role === 'visitor' ? wantsMail : studio.mailOptIn}
      disabled={follow.isPending}
      onChange={(mailOptIn) =>
        role === 'visitor' ? setWantsMail(mailOptIn) : follow.mutate(mailOptIn)
      }
    />
  );

  if (role === 'visitor') {
    return (
      <Card as="section" aria-label="Follow" className="space-y-4">
        {failure ? <FormAlert>{failure.message}</FormAlert> : null}
        <Button size="hand" onClick={() => follow.mutate(wantsMail)} disabled={follow.isPending}>
          {follow.isPending ? 'Following…' : 'Follow'}
        </Button>
        {mailSwitch}
      </Card>
    );
  }

  // Once following, the mail choice comes first: Unfollow sits last, away from a stray tap.
  return (
    <Card as="section" aria-label="Follow" className="space-y-4">
      <p className="text-lg font-bold">{standingWords[role]}</p>
      {failure ? <FormAlert>{failure.message}</FormAlert> : null}
      {mailSwitch}
      {role === 'viewer' ? (
        <Button variant="secondary" onClick={() => unfollow.mutate()} disabled={unfollow.isPending}>
          {unfollow.isPending ? 'Unfollowing…' : 'Unfollow'}
        </Button>
      ) : (
        // Hosts and moderators leave through a host's member list, not from here.
        <a href={`/console/studios/${studio.slug}/members`} className={textLinkClass}>
          Open the studio console
        </a>
      )}
    </Card>
  );
}
