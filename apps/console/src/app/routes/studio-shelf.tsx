import { useQuery } from '@tanstack/react-query';
import type { Dye, StockSolution } from '@vatside/contracts/workbench-shelf';
import { SafetyNote } from '@vatside/ui/SafetyNote';
import { useState } from 'react';
import { ChangeOrAddSection } from '../../components/ChangeOrAddSection.tsx';
import { Pager } from '../../components/Pager.tsx';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { firstPage, pickerPage } from '../../lib/studio-path.ts';
import { dyesQueryOptions, stockSolutionsQueryOptions } from '../../features/shelf/api.ts';
import { DyeForm } from '../../features/shelf/components/DyeForm.tsx';
import { DyesTable } from '../../features/shelf/components/DyesTable.tsx';
import { StockSolutionForm } from '../../features/shelf/components/StockSolutionForm.tsx';
import { StockSolutionsTable } from '../../features/shelf/components/StockSolutionsTable.tsx';
import { useWorkbench } from './workbench-role.ts';

/** The dye shelf: dyes, and the stock solutions mixed from them. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const [dyeOffset, setDyeOffset] = useState(0);
  const [stockOffset, setStockOffset] = useState(0);
  const dyes = useQuery(dyesQueryOptions(slug, { ...firstPage, offset: dyeOffset }));
  const stocks = useQuery(stockSolutionsQueryOptions(slug, { ...firstPage, offset: stockOffset }));
  // The stock form offers every dye, not only the page on screen.
  const allDyes = useQuery({ ...dyesQueryOptions(slug, pickerPage), enabled: canEdit });
  const [editingDye, setEditingDye] = useState<Dye>();
  const [editingStock, setEditingStock] = useState<StockSolution>();

  return (
    <div className="space-y-6">
      <SafetyNote />
      <Panel title="Dyes" intro="What is on the shelf, with the colorants its label lists.">
        <QueryView query={dyes} loading="Reading the shelf…" failed="The dyes could not be loaded">
          {(list) => (
            <>
              <DyesTable slug={slug} dyes={list.items} canEdit={canEdit} onEdit={setEditingDye} />
              <Pager page={list.page} noun="dyes" onOffset={setDyeOffset} />
            </>
          )}
        </QueryView>
        {canEdit ? (
          <ChangeOrAddSection
            editing={editingDye}
            changeTitle={(dye) => `Change ${dye.name}`}
            addTitle="Add a dye"
            form={(dye) => (
              <DyeForm
                key={dye?.id}
                slug={slug}
                editing={dye}
                onDone={() => setEditingDye(undefined)}
              />
            )}
          />
        ) : null}
      </Panel>
      <Panel
        title="Stock solutions"
        intro="Jars of dye dissolved at a known strength. Adjust what is left by hand when it differs."
      >
        <QueryView
          query={stocks}
          loading="Counting the jars…"
          failed="The stock solutions could not be loaded"
        >
          {(list) => (
            <>
              <StockSolutionsTable
                slug={slug}
                stocks={list.items}
                canEdit={canEdit}
                onEdit={setEditingStock}
              />
              <Pager page={list.page} noun="jars" onOffset={setStockOffset} />
            </>
          )}
        </QueryView>
        {canEdit && allDyes.data ? (
          <ChangeOrAddSection
            editing={editingStock}
            changeTitle={(stock) => `Change the ${stock.dyeName} jar`}
            addTitle="Add a stock solution"
            form={(stock) => (
              <StockSolutionForm
                // A new dye on the shelf starts the add form afresh, with it on offer.
                key={stock?.id ?? `new-${allDyes.data.items.length}`}
                slug={slug}
                dyes={allDyes.data.items}
                editing={stock}
                onDone={() => setEditingStock(undefined)}
              />
            )}
          />
        ) : null}
      </Panel>
    </div>
  );
}
