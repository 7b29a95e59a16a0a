import { Link, useLocation } from 'react-router-dom';
import type { StudioRole } from '@vatside/contracts/roles';
import { useMe } from '../session.ts';
import { withNext } from './next-path.ts';

const roleWords: Record<StudioRole, string> = {
  host: 'host of',
  moderator: 'moderator of',
  viewer: 'viewer at',
};

/**
 * The header's "who is here": the person and their role in the studio on screen, or a way in.
 * Sits on the dark header, hence the light colors.
 */
export function AccountBadge({ studioSlug }: { studioSlug?: string | undefined }) {
  const { data: me, isPending } = useMe();
  const location = useLocation();
  if (isPending) return <span className="min-h-12" aria-hidden="true" />;

  if (!me) {
    const onAccountScreen = /^\/(sign-in|sign-up)/.test(location.pathname);
    return onAccountScreen ? null : (
      <Link
        to={withNext('/sign-in', location.pathname + location.search)}
        className="inline-flex min-h-12 items-center rounded-xl border-2 border-wool-50 px-5 font-bold text-wool-50 hover:bg-vat-800"
      >
        Sign in
      </Link>
    );
  }

  const membership = me.memberships.find((m) => m.studio.slug === studioSlug);
  return (
    <Link
      to="/profile"
      className="inline-flex min-h-12 max-w-full flex-wrap items-center gap-x-1.5 rounded-lg px-2 leading-tight text-wool-50 hover:bg-vat-800"
    >
      <span className="font-bold">{me.profile.name}</span>{' '}
      {membership ? (
        <span className="text-marigold-300">
          · {roleWords[membership.role]} {membership.studio.name}
        </span>
      ) : null}
    </Link>
  );
}
