import { buttonClass } from '@vatside/ui/Button';
import { Card } from '@vatside/ui/Card';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useMe } from '@vatside/ui/session.ts';
import { Link } from 'react-router-dom';
import { deskMemberships } from './desk-roles.ts';

/** The desk's first block: the studios this person runs, or a way in. */
export function MyStudios() {
  const { data: me, isPending } = useMe();
  if (isPending) return <LoadingBlock label="Checking who is here…" />;

  if (!me) {
    return (
      <Card className="space-y-3">
        <p className="text-lg">Sign in to plan dye-alongs and look after your studio.</p>
        <div className="flex flex-wrap gap-3">
          <Link to="/sign-in" className={buttonClass()}>
            Sign in
          </Link>
          <Link to="/sign-up" className={buttonClass('secondary')}>
            Create an account
          </Link>
        </div>
      </Card>
    );
  }

  const studios = deskMemberships(me.memberships);
  return (
    <div className="space-y-4">
      {studios.length === 0 ? (
        <p className="text-lg">
          You do not help run a studio yet. Start your own, or accept an invitation from a host.
        </p>
      ) : (
        <ul className="grid gap-4 md:grid-cols-2">
          {studios.map(({ studio, role }) => (
            <Card as="li" key={studio.id} className="flex items-center justify-between gap-3">
              <div>
                <h3 className="font-display text-2xl font-semibold">{studio.name}</h3>
                <p className="text-vat-800">You are {role === 'host' ? 'a host' : 'a moderator'}</p>
              </div>
              <Link
                to={`/studios/${studio.slug}/members`}
                aria-label={`Members of ${studio.name}`}
                className={buttonClass('secondary')}
              >
                Members
              </Link>
            </Card>
          ))}
        </ul>
      )}
      <Link to="/studios/new" className={buttonClass()}>
        Start a studio
      </Link>
    </div>
  );
}
