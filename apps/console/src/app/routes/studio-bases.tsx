import { useQuery } from '@tanstack/react-query';
import type { Base, Pot } from '@vatside/contracts/workbench-bases';
import { useState } from 'react';
import { ChangeOrAddSection } from '../../components/ChangeOrAddSection.tsx';
import { Pager } from '../../components/Pager.tsx';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { firstPage } from '../../lib/studio-path.ts';
import { basesQueryOptions, potsQueryOptions } from '../../features/bases/api.ts';
import { BaseForm } from '../../features/bases/components/BaseForm.tsx';
import { BasesTable } from '../../features/bases/components/BasesTable.tsx';
import { PotForm } from '../../features/bases/components/PotForm.tsx';
import { PotsTable } from '../../features/bases/components/PotsTable.tsx';
import { useWorkbench } from './workbench-role.ts';

/** Yarn bases (with the fiber check) and the pots they are dyed in. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const [baseOffset, setBaseOffset] = useState(0);
  const [potOffset, setPotOffset] = useState(0);
  const bases = useQuery(basesQueryOptions(slug, { ...firstPage, offset: baseOffset }));
  const pots = useQuery(potsQueryOptions(slug, { ...firstPage, offset: potOffset }));
  const [editingBase, setEditingBase] = useState<Base>();
  const [editingPot, setEditingPot] = useState<Pot>();

  return (
    <div className="space-y-6">
      <Panel
        title="Bases"
        intro="The undyed yarns you buy in, and what part of each takes acid dye and food color."
      >
        <QueryView
          query={bases}
          loading="Reading the bases…"
          failed="The bases could not be loaded"
        >
          {(list) => (
            <>
              <BasesTable
                slug={slug}
                bases={list.items}
                canEdit={canEdit}
                onEdit={setEditingBase}
              />
              <Pager page={list.page} noun="bases" onOffset={setBaseOffset} />
            </>
          )}
        </QueryView>
        {canEdit ? (
          <ChangeOrAddSection
            editing={editingBase}
            changeTitle={(base) => `Change ${base.name}`}
            addTitle="Add a base"
            form={(base) => (
              <BaseForm
                key={base?.id}
                slug={slug}
                editing={base}
                onDone={() => setEditingBase(undefined)}
              />
            )}
          />
        ) : null}
      </Panel>
      <Panel
        title="Pots"
        intro="Fill a pot to about four fifths so the bath can simmer without boiling over."
      >
        <QueryView query={pots} loading="Reading the pots…" failed="The pots could not be loaded">
          {(list) => (
            <>
              <PotsTable slug={slug} pots={list.items} canEdit={canEdit} onEdit={setEditingPot} />
              <Pager page={list.page} noun="pots" onOffset={setPotOffset} />
            </>
          )}
        </QueryView>
        {canEdit ? (
          <ChangeOrAddSection
            editing={editingPot}
            changeTitle={(pot) => `Change ${pot.name}`}
            addTitle="Add a pot"
            form={(pot) => (
              <PotForm
                key={pot?.id}
                slug={slug}
                editing={pot}
                onDone={() => setEditingPot(undefined)}
              />
            )}
          />
        ) : null}
      </Panel>
    </div>
  );
}
