import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'react-router-dom';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { archiveSearchQueryOptions, type ArchiveSearch } from '../../features/archive/api.ts';
import { ArchiveResults } from '../../features/archive/components/ArchiveResults.tsx';
import { ArchiveSearchForm } from '../../features/archive/components/ArchiveSearchForm.tsx';
import { basesQueryOptions } from '../../features/bases/api.ts';
import { dyesQueryOptions } from '../../features/shelf/api.ts';
import { pickerPage } from '../../lib/studio-path.ts';
import { useWorkbench } from './workbench-role.ts';

const fields = ['month', 'hex', 'baseId', 'dyeId'] as const;

/** Every colorway of the studio's archived months: search by month, color, base and dye. */
export function Component() {
  const { slug } = useWorkbench();
  // The search lives in the address, so a result can be shared and the back button works.
  const [params, setParams] = useSearchParams();
  const search: ArchiveSearch = Object.fromEntries(
    fields.flatMap((f) => (params.get(f) ? [[f, params.get(f)!]] : [])),
  );
  const results = useQuery(archiveSearchQueryOptions(slug, search));
  const bases = useQuery(basesQueryOptions(slug, pickerPage));
  const dyes = useQuery(dyesQueryOptions(slug, pickerPage));

  return (
    <div className="space-y-6">
      <Panel
        title="Archive"
        intro="Every colorway of an archived month, with its plan, what went into the pot and its bath record."
      >
        <ArchiveSearchForm
          key={params.toString()}
          initial={search}
          bases={bases.data?.items ?? []}
          dyes={dyes.data?.items ?? []}
          onSearch={(next) => setParams(new URLSearchParams(next as Record<string, string>))}
        />
      </Panel>
      <Panel
        title={search.hex ? `Nearest to ${search.hex}` : 'Archived colorways'}
        intro={
          search.hex
            ? 'Closest first by CIEDE2000 color difference to any of a colorway’s swatches.'
            : undefined
        }
      >
        <QueryView
          query={results}
          loading="Searching the archive…"
          failed="The archive could not be searched"
        >
          {(list) => <ArchiveResults items={list.items} byColor={Boolean(search.hex)} />}
        </QueryView>
      </Panel>
    </div>
  );
}
