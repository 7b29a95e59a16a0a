import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { useMe } from '@vatside/ui/session.ts';
import { useNavigate } from 'react-router-dom';
import { Panel } from '../../components/Panel.tsx';
import { useCreateDyeAlong } from '../../features/dye-alongs/api.ts';
import { DyeAlongForm } from '../../features/dye-alongs/components/DyeAlongForm.tsx';
import { blankDyeAlong, createBody } from '../../features/dye-alongs/form-values.ts';
import { useDyeAlongChoices } from './dye-along-choices.ts';
import { useWorkbench } from './workbench-role.ts';

/** Plan a new dye-along; it starts as a draft that only the studio's team sees. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const { data: me } = useMe();
  const choices = useDyeAlongChoices(slug);
  const create = useCreateDyeAlong(slug);
  const navigate = useNavigate();

  if (!canEdit) {
    return <p className="text-lg">Only the studio’s hosts plan dye-alongs.</p>;
  }
  return (
    <Panel
      title="Plan a dye-along"
      intro="It stays a draft until you announce it; nobody outside the studio sees it before then."
    >
      {choices.error ? (
        <ErrorPanel
          title="The colorways and images could not be loaded"
          error={choices.error}
          onRetry={choices.retry}
        />
      ) : !choices.colorways || !choices.images || !me ? (
        <LoadingBlock label="Gathering colorways and images…" />
      ) : (
        <DyeAlongForm
          initial={blankDyeAlong(me.profile.timeZone)}
          colorwayChoices={choices.colorways}
          imageChoices={choices.images}
          submitLabel="Save as draft"
          busyLabel="Saving…"
          onSave={async (values) => {
            const created = await create.mutateAsync(createBody(values));
            await navigate(`../${created.id}`, { relative: 'path' });
          }}
        />
      )}
    </Panel>
  );
}
