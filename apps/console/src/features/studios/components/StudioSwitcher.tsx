import { useMe } from '@vatside/ui/session.ts';
import { Link, useLocation } from 'react-router-dom';
import { deskMemberships } from './desk-roles.ts';

/** Lists the studios the person helps run; the current one lives in the URL. */
export function StudioSwitcher({ currentSlug }: { currentSlug: string | undefined }) {
  const { data: me } = useMe();
  const { pathname } = useLocation();
  const studios = deskMemberships(me?.memberships ?? []);
  if (studios.length === 0) return null;
  const current = studios.find((m) => m.studio.slug === currentSlug);

  return (
    // Keyed by the path so it closes once a studio is picked.
    <details key={pathname} className="relative">
      <summary className="flex min-h-12 cursor-pointer list-none items-center gap-2 rounded-lg border-2 border-vat-200 px-4 font-bold text-wool-50 hover:bg-vat-800">
        <span className="sr-only">Switch studio, now:</span>{' '}
        {current?.studio.name ?? 'Pick a studio'}
        <span aria-hidden="true">▾</span>
      </summary>
      <ul className="absolute z-20 mt-2 w-72 rounded-card border border-wool-200 bg-wool-50 p-2 text-vat-950 shadow-card">
        {studios.map(({ studio, role }) => (
          <li key={studio.id}>
            <Link
              to={`/studios/${studio.slug}/members`}
              aria-current={studio.slug === currentSlug ? 'page' : undefined}
              className="flex min-h-12 items-center justify-between gap-3 rounded-lg px-3 hover:bg-vat-100 aria-[current=page]:bg-vat-100"
            >
              <span className="font-bold">{studio.name}</span>
              <span className="text-sm text-vat-800">{role}</span>
            </Link>
          </li>
        ))}
        <li className="mt-1 border-t border-wool-200 pt-1">
          <Link
            to="/studios/new"
            className="flex min-h-12 items-center rounded-lg px-3 font-bold text-vat-700 hover:bg-vat-100"
          >
            + Start a studio
          </Link>
        </li>
      </ul>
    </details>
  );
}
