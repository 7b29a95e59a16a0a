import { NavLink, Outlet, useParams } from 'react-router-dom';
import { AccountBadge } from '@vatside/ui/account/AccountBadge';
import { DyeStripes } from '@vatside/ui/DyeStripes';
import { SafetyNote } from '@vatside/ui/SafetyNote';

const navLinkClass = ({ isActive }: { isActive: boolean }) =>
  [
    'inline-flex min-h-12 items-center rounded-lg px-4 font-bold',
    isActive ? 'bg-wool-50 text-vat-950' : 'text-wool-50 hover:bg-vat-800',
  ].join(' ');

export function AppShell() {
  const { slug } = useParams();
  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-10 focus:bg-wool-50 focus:p-3"
      >
        Skip to content
      </a>
      <header className="bg-vat-900 text-wool-50 [--vs-focus:var(--color-marigold-300)]">
        <div className="mx-auto flex max-w-3xl flex-wrap items-center gap-x-4 gap-y-1 px-4 py-2">
          <NavLink to="/" className="flex min-h-12 items-center gap-3 rounded-lg">
            <DyeStripes />
            <span className="font-display text-3xl font-semibold tracking-tight">Vatside</span>
          </NavLink>
          <nav aria-label="Main" className="flex gap-1">
            <NavLink to="/" end className={navLinkClass}>
              Studios
            </NavLink>
          </nav>
          <div className="ml-auto">
            <AccountBadge studioSlug={slug} />
          </div>
        </div>
      </header>
      <main id="main" className="mx-auto w-full max-w-3xl flex-1 px-4 py-6">
        <Outlet />
      </main>
      <footer className="mx-auto w-full max-w-3xl px-4 pb-8">
        <SafetyNote />
      </footer>
    </div>
  );
}
