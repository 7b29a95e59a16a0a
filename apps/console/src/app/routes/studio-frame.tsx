import { useQuery } from '@tanstack/react-query';
import { RequireSignIn } from '@vatside/ui/account/RequireSignIn';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { NavLink, Outlet, useParams } from 'react-router-dom';
import { ReviewNavLink } from '../../features/review/components/ReviewNavLink.tsx';
import { studioQueryOptions } from '../../features/studios/api.ts';

/** Every /studios/:slug screen: signed in, and a host or moderator of that studio. */
export function Component() {
  const { slug = '' } = useParams();
  return (
    <RequireSignIn>
      <StudioGate slug={slug} />
    </RequireSignIn>
  );
}

function StudioGate({ slug }: { slug: string }) {
  const {
    data: studio,
    error,
    isPending,
    isFetching,
    refetch,
  } = useQuery(studioQueryOptions(slug));
  if (isPending) return <LoadingBlock label="Opening the studio…" />;
  if (error) {
    return (
      <ErrorPanel
        title="This studio could not be opened"
        error={error}
        onRetry={() => void refetch()}
        retrying={isFetching}
      />
    );
  }
  if (studio.myRole !== 'host' && studio.myRole !== 'moderator') {
    return (
      <section className="max-w-xl space-y-4">
        <h1 className="font-display text-3xl font-semibold">{studio.name}</h1>
        <p className="text-lg">
          This part of the console is for the studio’s hosts and moderators. You can still follow
          the studio on its public page.
        </p>
        {/* The public page belongs to the viewer app, outside the console's base path. */}
        <a
          href={`/s/${studio.slug}`}
          className="inline-flex min-h-12 items-center rounded-xl border-2 border-vat-800 px-5 font-bold hover:bg-vat-100"
        >
          Open the public page
        </a>
      </section>
    );
  }
  return (
    <div className="space-y-6">
      <div className="flex items-center gap-4">
        <span
          aria-hidden="true"
          className="h-14 w-3 shrink-0 rounded-full"
          style={{ backgroundColor: studio.accentHex }}
        />
        <div>
          <h1 className="font-display text-4xl font-semibold">{studio.name}</h1>
          {studio.tagline ? <p className="text-lg text-vat-800">{studio.tagline}</p> : null}
        </div>
      </div>
      <WorkbenchNav slug={slug} />
      <Outlet />
    </div>
  );
}

const workbenchSections = [
  { to: 'shelf', label: 'Dye shelf' },
  { to: 'bases', label: 'Bases & pots' },
  { to: 'colorways', label: 'Colorways' },
  { to: 'calculators', label: 'Calculators' },
  { to: 'inspiration', label: 'Inspiration' },
  { to: 'dye-alongs', label: 'Dye-alongs' },
  { to: 'archive', label: 'Archive' },
] as const;

const navClass = (isActive: boolean) =>
  [
    'inline-flex min-h-12 shrink-0 items-center rounded-xl border-2 px-4 font-bold whitespace-nowrap',
    isActive
      ? 'border-vat-800 bg-vat-800 text-wool-50'
      : 'border-vat-800 bg-wool-50 text-vat-900 hover:bg-vat-100',
  ].join(' ');

/** The planning screens of the studio, one tap apart, and the review queue. */
function WorkbenchNav({ slug }: { slug: string }) {
  return (
    <nav aria-label="Workbench" className="flex flex-wrap gap-2">
      {workbenchSections.map((section) => (
        <NavLink key={section.to} to={section.to} className={({ isActive }) => navClass(isActive)}>
          {section.label}
        </NavLink>
      ))}
      <ReviewNavLink slug={slug} className={navClass} />
    </nav>
  );
}
