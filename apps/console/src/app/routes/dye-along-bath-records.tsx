import { useQuery } from '@tanstack/react-query';
import type { BathRecord } from '@vatside/contracts/archive';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { Link, useParams } from 'react-router-dom';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { bathRecordsQueryOptions, colorwayPhotosQueryOptions } from '../../features/archive/api.ts';
import { BathRecordForm } from '../../features/archive/components/BathRecordForm.tsx';
import { BathRecordFacts } from '../../features/archive/components/BathRecordFacts.tsx';
import { useWorkbench } from './workbench-role.ts';

/** The month's bath records: the host writes one per colorway after the live session. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const { dyeAlongId = '' } = useParams();
  const records = useQuery(bathRecordsQueryOptions(slug, dyeAlongId));
  return (
    <div className="space-y-6">
      <Link to=".." relative="path" className={`${textLinkClass} gap-1`}>
        <span aria-hidden="true">←</span>Back to the dye-along
      </Link>
      <h2 className="font-display text-3xl font-semibold">Bath records</h2>
      <QueryView
        query={records}
        loading="Gathering the bath records…"
        failed="The bath records could not be loaded"
      >
        {(list) =>
          !list.editable ? (
            <p>Bath records are written once the dye-along has gone live.</p>
          ) : (
            list.records.map((record) => (
              <Panel key={record.colorwayId} title={record.colorwayName}>
                {canEdit ? (
                  <EditRecord slug={slug} dyeAlongId={dyeAlongId} record={record} />
                ) : (
                  <BathRecordFacts record={record} />
                )}
              </Panel>
            ))
          )
        }
      </QueryView>
    </div>
  );
}

function EditRecord({
  slug,
  dyeAlongId,
  record,
}: {
  slug: string;
  dyeAlongId: string;
  record: BathRecord;
}) {
  const photos = useQuery(colorwayPhotosQueryOptions(slug, record.colorwayId));
  return (
    <QueryView
      query={photos}
      loading="Gathering photos…"
      failed="The colorway’s photos could not be loaded"
    >
      {(list) => (
        <BathRecordForm slug={slug} dyeAlongId={dyeAlongId} record={record} photos={list.items} />
      )}
    </QueryView>
  );
}
