import { AccountBadge } from '@vatside/ui/account/AccountBadge';
import { useSignOut } from '@vatside/ui/account/use-sign-out.ts';
import { standingIn, useMe } from '@vatside/ui/session.ts';
import { NavLink, Outlet, useParams } from 'react-router-dom';
import { StudioSwitcher } from '../features/studios/components/StudioSwitcher.tsx';

const navLinkClass = ({ isActive }: { isActive: boolean }) =>
  [
    'inline-flex min-h-12 items-center rounded-lg px-4 font-bold',
    isActive ? 'bg-wool-50 text-vat-950' : 'text-wool-50 hover:bg-vat-800',
  ].join(' ');

export function AppShell() {
  const { slug } = useParams();
  const { data: me } = useMe();
  const signOut = useSignOut();

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-10 focus:bg-wool-50 focus:p-3"
      >
        Skip to content
      </a>
      <header className="bg-vat-900 text-wool-50 [--vs-focus:var(--color-marigold-300)]">
        <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-6 py-3">
          <NavLink to="/" className="flex min-h-12 items-center gap-3 rounded-lg">
            <DyeStripes />
            <span className="font-display text-3xl font-semibold tracking-tight">Vatside</span>
            <span className="rounded-md border border-marigold-300 px-2 py-0.5 text-sm font-bold text-marigold-300">
              Console
            </span>
          </NavLink>
          <StudioSwitcher currentSlug={slug} />
          <nav aria-label="Console sections" className="flex flex-wrap gap-2">
            <NavLink to="/" end className={navLinkClass}>
              Studio desk
            </NavLink>
            {slug ? (
              <NavLink to={`/studios/${slug}/members`} className={navLinkClass}>
                Members
              </NavLink>
            ) : null}
            {slug && standingIn(me, slug) === 'host' ? (
              <NavLink to={`/studios/${slug}/live`} className={navLinkClass}>
                Stovetop
              </NavLink>
            ) : null}
          </nav>
          <div className="ml-auto flex flex-wrap items-center gap-2">
            <AccountBadge studioSlug={slug} />
            {me ? (
              <button
                type="button"
                onClick={() => signOut.mutate()}
                disabled={signOut.isPending}
                className="inline-flex min-h-12 items-center rounded-lg px-4 font-bold text-wool-50 underline underline-offset-4 hover:bg-vat-800"
              >
                Sign out
              </button>
            ) : null}
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-6xl flex-1 px-6 py-8">
        <Outlet />
      </main>
    </div>
  );
}

/** Three dip-dyed bands: madder, marigold and vat. Our mark beside the wordmark. */
function DyeStripes() {
  return (
    <span aria-hidden="true" className="flex h-9 w-3 flex-col overflow-hidden rounded-full">
      <span className="flex-1 bg-madder-600" />
      <span className="flex-1 bg-marigold-500" />
      <span className="flex-1 bg-vat-200" />
    </span>
  );
}
