import { useQuery } from '@tanstack/react-query';
import { viewerPaths, type DyeAlongDetail } from '@vatside/contracts/dye-alongs';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useMe } from '@vatside/ui/session.ts';
import { Link, useParams } from 'react-router-dom';
import { Panel } from '../../components/Panel.tsx';
import { dyeAlongQueryOptions, useUpdateDyeAlong } from '../../features/dye-alongs/api.ts';
import { DyeAlongForm } from '../../features/dye-alongs/components/DyeAlongForm.tsx';
import { StatusBadge } from '../../features/dye-alongs/components/StatusBadge.tsx';
import { StatusPanel } from '../../features/dye-alongs/components/StatusPanel.tsx';
import { SuppliesPanel } from '../../features/dye-alongs/components/SuppliesPanel.tsx';
import { formValuesOf, updateBody } from '../../features/dye-alongs/form-values.ts';
import { RecapPanel } from '../../features/recap/components/RecapPanel.tsx';
import { useDyeAlongChoices } from './dye-along-choices.ts';
import { useWorkbench } from './workbench-role.ts';

// Right after announcing, the e-mail counts move for a while: watch them for this long.
const WATCH_MAIL_MS = 5 * 60_000;
const watchingMail = (d: DyeAlongDetail | undefined) =>
  !!d?.announcedAt && d.mail.queued > 0 && Date.now() - Date.parse(d.announcedAt) < WATCH_MAIL_MS;

/** One dye-along: where it stands, its recipe cards, supplies and prep, and its details. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const { dyeAlongId = '' } = useParams();
  const { data: me } = useMe();
  const detail = useQuery({
    ...dyeAlongQueryOptions(slug, dyeAlongId),
    refetchInterval: (query) => (watchingMail(query.state.data) ? 3_000 : false),
  });

  if (detail.isPending) return <LoadingBlock label="Opening the dye-along…" />;
  if (detail.isError) {
    return (
      <ErrorPanel
        title="This dye-along could not be opened"
        error={detail.error}
        onRetry={() => void detail.refetch()}
        retrying={detail.isFetching}
      />
    );
  }
  const dyeAlong = detail.data;
  return (
    <div className="space-y-6">
      <div className="space-y-2">
        <Link to=".." relative="path" className={`${textLinkClass} gap-1`}>
          <span aria-hidden="true">←</span>All dye-alongs
        </Link>
        <div className="flex flex-wrap items-center gap-3">
          <h2 className="font-display text-3xl font-semibold">{dyeAlong.title}</h2>
          <StatusBadge status={dyeAlong.status} />
        </div>
        <p className="text-lg">{dyeAlong.startsAtHost.label}</p>
        {dyeAlong.status !== 'draft' ? (
          // The public page lives in the viewer app, outside the console's base path.
          <a href={viewerPaths.dyeAlong(slug, dyeAlong.id)} className={textLinkClass}>
            Open the viewers’ page
          </a>
        ) : null}
      </div>
      <Panel title="Where it stands">
        <StatusPanel slug={slug} dyeAlong={dyeAlong} canMove={canEdit} />
      </Panel>
      <Panel title="Recipe cards" intro="One printable sheet per colorway, A4 or US Letter.">
        {dyeAlong.colorways.length === 0 ? (
          <p>Add the month’s colorways below to get their cards.</p>
        ) : (
          <ul className="flex flex-wrap gap-x-6">
            {dyeAlong.colorways.map((colorway) => (
              <li key={colorway.id}>
                <Link to={`recipe-card/${colorway.id}`} className={textLinkClass}>
                  Recipe card: {colorway.name}
                </Link>
              </li>
            ))}
          </ul>
        )}
      </Panel>
      {['live', 'sharing', 'recap', 'archived'].includes(dyeAlong.status) ? (
        <Panel
          title="Bath records"
          intro="After the live session: bath volume, temperature, time, lots, photos and notes for each colorway, kept in the archive."
        >
          <Link to="bath-records" className={textLinkClass}>
            {canEdit ? 'Fill in the bath records' : 'Read the bath records'}
          </Link>
        </Panel>
      ) : null}
      <Panel title="Supplies and prep">
        <SuppliesPanel
          slug={slug}
          dyeAlongId={dyeAlong.id}
          initialSystem={me?.profile.unitSystem ?? 'us'}
          initialWeightG={me?.profile.defaultSkeinWeightG ?? 100}
        />
      </Panel>
      {dyeAlong.status !== 'draft' ? <RecapPanel slug={slug} dyeAlongId={dyeAlong.id} /> : null}
      {canEdit ? <EditPanel slug={slug} dyeAlong={dyeAlong} /> : null}
    </div>
  );
}

function EditPanel({ slug, dyeAlong }: { slug: string; dyeAlong: DyeAlongDetail }) {
  const choices = useDyeAlongChoices(slug);
  const update = useUpdateDyeAlong(slug, dyeAlong.id);
  const initial = formValuesOf(dyeAlong);
  return (
    <Panel title="Details" intro="Changes reach the viewers’ page at once.">
      {choices.error ? (
        <ErrorPanel
          title="The colorways and images could not be loaded"
          error={choices.error}
          onRetry={choices.retry}
        />
      ) : !choices.colorways || !choices.images ? (
        <LoadingBlock label="Gathering colorways and images…" />
      ) : (
        <DyeAlongForm
          key={dyeAlong.id}
          initial={initial}
          colorwayChoices={choices.colorways}
          imageChoices={choices.images}
          submitLabel="Save changes"
          busyLabel="Saving…"
          onSave={async (values) => {
            const patch = updateBody(initial, values);
            if (Object.keys(patch).length === 0) return 'Nothing changed.';
            await update.mutateAsync(patch);
            return 'Saved.';
          }}
        />
      )}
    </Panel>
  );
}
