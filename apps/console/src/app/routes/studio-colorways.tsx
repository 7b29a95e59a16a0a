import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { useNavigate } from 'react-router-dom';
import { AddSection } from '../../components/AddSection.tsx';
import { Pager } from '../../components/Pager.tsx';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { firstPage, pickerPage } from '../../lib/studio-path.ts';
import { basesQueryOptions } from '../../features/bases/api.ts';
import { colorwaysQueryOptions } from '../../features/colorways/api.ts';
import { ColorwaysTable } from '../../features/colorways/components/ColorwaysTable.tsx';
import { NewColorwayForm } from '../../features/colorways/components/NewColorwayForm.tsx';
import { useWorkbench } from './workbench-role.ts';

/** Every colorway of the studio, and a way to start a new one. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const navigate = useNavigate();
  const [offset, setOffset] = useState(0);
  const colorways = useQuery(colorwaysQueryOptions(slug, { ...firstPage, offset }));
  const bases = useQuery({ ...basesQueryOptions(slug, pickerPage), enabled: canEdit });

  return (
    <Panel title="Colorways" intro="Open a colorway to write its recipe and run sheet.">
      <QueryView
        query={colorways}
        loading="Gathering colorways…"
        failed="The colorways could not be loaded"
      >
        {(list) => (
          <>
            <ColorwaysTable slug={slug} colorways={list.items} canEdit={canEdit} />
            <Pager page={list.page} noun="colorways" onOffset={setOffset} />
          </>
        )}
      </QueryView>
      {canEdit ? (
        <AddSection title="Start a colorway">
          <QueryView
            query={bases}
            loading="Reading the bases…"
            failed="The bases could not be loaded"
          >
            {(list) => (
              <NewColorwayForm
                slug={slug}
                bases={list.items}
                onCreated={(id) => void navigate(id)}
              />
            )}
          </QueryView>
        </AddSection>
      ) : null}
    </Panel>
  );
}
