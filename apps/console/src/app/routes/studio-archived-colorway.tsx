import { useQuery } from '@tanstack/react-query';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Swatch } from '@vatside/ui/Swatch';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { archivedColorwayQueryOptions } from '../../features/archive/api.ts';
import { BathRecordFacts } from '../../features/archive/components/BathRecordFacts.tsx';
import { DyeAgainForm } from '../../features/archive/components/DyeAgainForm.tsx';
import { PlanVsActual } from '../../features/archive/components/PlanVsActual.tsx';
import { basesQueryOptions, potsQueryOptions } from '../../features/bases/api.ts';
import { pickerPage } from '../../lib/studio-path.ts';
import { useWorkbench } from './workbench-role.ts';

/** One archived colorway: plan against the dye log, the bath record, photos, and dye again. */
export function Component() {
  const { slug } = useWorkbench();
  const { archivedColorwayId = '' } = useParams();
  const navigate = useNavigate();
  const detail = useQuery(archivedColorwayQueryOptions(slug, archivedColorwayId));
  const bases = useQuery(basesQueryOptions(slug, pickerPage));
  const pots = useQuery(potsQueryOptions(slug, pickerPage));

  return (
    <QueryView
      query={detail}
      loading="Opening the archived colorway…"
      failed="This archived colorway could not be opened"
    >
      {(colorway) => (
        <div className="space-y-6">
          <div className="space-y-2">
            <Link to=".." relative="path" className={`${textLinkClass} gap-1`}>
              <span aria-hidden="true">←</span>The archive
            </Link>
            <h2 className="font-display text-3xl font-semibold">{colorway.colorwayName}</h2>
            <p className="text-lg">
              {colorway.dyeAlongTitle} · {colorway.monthLabel}
              {colorway.baseName ? ` · ${colorway.baseName}` : ''}
              {colorway.potName ? ` · ${colorway.potName}` : ''}
            </p>
            <ul aria-label="Swatches" className="flex flex-wrap gap-x-6 gap-y-2">
              {colorway.swatches.map((s) => (
                <li key={`${s.hex}-${s.name}`}>
                  <Swatch hex={s.hex} label={s.name || s.hex} showHex />
                </li>
              ))}
            </ul>
          </div>
          <Panel
            title="Planned and actual"
            intro={`Planned for ${colorway.skeinCount} × ${colorway.weightOfGoodsG} g at ${colorway.liquorRatio}:1; actual from the dye log of the live session.`}
          >
            <PlanVsActual lines={colorway.lines} />
          </Panel>
          <Panel title="Bath record">
            <BathRecordFacts record={colorway.bathRecord} />
            {colorway.photos.length ? (
              <ul aria-label="Photos" className="flex flex-wrap gap-4">
                {colorway.photos.map((photo, i) => (
                  <li key={photo.id}>
                    <a href={photo.webUrl} className="block rounded-xl">
                      <img
                        src={photo.thumbUrl}
                        alt={`Finished skein ${i + 1} of ${colorway.colorwayName}`}
                        className="h-40 w-auto rounded-xl border-2 border-wool-300"
                      />
                    </a>
                  </li>
                ))}
              </ul>
            ) : null}
            {colorway.colorwayNotes ? (
              <p>
                <span className="font-bold">From the plan: </span>
                {colorway.colorwayNotes}
              </p>
            ) : null}
          </Panel>
          <Panel
            title="Dye again"
            intro="Works from what actually went into the pot, checks the dye shelf and splits the skeins into batches your pot holds."
          >
            <DyeAgainForm
              bases={bases.data?.items ?? []}
              pots={pots.data?.items ?? []}
              initialBaseId={colorway.baseId}
              onOpen={({ baseId, skeins, potId }) => {
                const query = new URLSearchParams({ baseId, skeins: String(skeins) });
                if (potId) query.set('potId', potId);
                void navigate(`/studios/${slug}/archive/${colorway.id}/batch-sheet?${query}`);
              }}
            />
          </Panel>
        </div>
      )}
    </QueryView>
  );
}
