import { keepPreviousData, useQuery } from '@tanstack/react-query';
import type { Step } from '@vatside/contracts/workbench-colorways';
import type { MeasureSystem } from '@vatside/dye-kit';
import { textLinkClass } from '@vatside/ui/link-class.ts';
import { ErrorPanel } from '@vatside/ui/ErrorPanel';
import { LoadingBlock } from '@vatside/ui/LoadingBlock';
import { SafetyNote } from '@vatside/ui/SafetyNote';
import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ChangeOrAddSection } from '../../components/ChangeOrAddSection.tsx';
import { Panel } from '../../components/Panel.tsx';
import { QueryView } from '../../components/QueryView.tsx';
import { SystemSwitch } from '../../components/SystemSwitch.tsx';
import { pickerPage } from '../../lib/studio-path.ts';
import { basesQueryOptions, potsQueryOptions } from '../../features/bases/api.ts';
import { colorwayQueryOptions } from '../../features/colorways/api.ts';
import { AmountsView } from '../../features/colorways/components/AmountsView.tsx';
import { ColorwayEditor } from '../../features/colorways/components/ColorwayEditor.tsx';
import { lineAmountLabels } from '../../features/colorways/components/line-amounts.ts';
import { OtherSkeinBox } from '../../features/colorways/components/OtherSkeinBox.tsx';
import { inspirationImagesQueryOptions } from '../../features/inspiration/api.ts';
import { stepsQueryOptions } from '../../features/run-sheet/api.ts';
import { RunSheet } from '../../features/run-sheet/components/RunSheet.tsx';
import { StepForm } from '../../features/run-sheet/components/StepForm.tsx';
import { dyesQueryOptions, stockSolutionsQueryOptions } from '../../features/shelf/api.ts';
import { useWorkbench } from './workbench-role.ts';

/** One colorway: its recipe, the server's amounts, another skein's amounts, and the run sheet. */
export function Component() {
  const { slug, canEdit } = useWorkbench();
  const { colorwayId = '' } = useParams();
  const [system, setSystem] = useState<MeasureSystem>('us');
  // Switching measures keeps the editor (and any unsaved edits) on screen while amounts reload.
  const colorway = useQuery({
    ...colorwayQueryOptions(slug, colorwayId, system),
    placeholderData: keepPreviousData,
  });
  const steps = useQuery(stepsQueryOptions(slug, colorwayId));
  const [editingStep, setEditingStep] = useState<{ step: Step; number: number }>();
  const bases = useQuery(basesQueryOptions(slug, pickerPage));
  const pots = useQuery(potsQueryOptions(slug, pickerPage));
  const stocks = useQuery(stockSolutionsQueryOptions(slug, pickerPage));
  const dyes = useQuery(dyesQueryOptions(slug, pickerPage));
  const images = useQuery(inspirationImagesQueryOptions(slug, pickerPage));
  const choiceFailure = [bases, pots, stocks, dyes, images].find((q) => q.isError);

  return (
    <div className="space-y-6">
      <Link to=".." relative="path" className={textLinkClass}>
        ← All colorways
      </Link>
      <QueryView
        query={colorway}
        loading="Opening the colorway…"
        failed="This colorway could not be opened"
      >
        {(detail) => (
          <div className="grid items-start gap-6 xl:grid-cols-2">
            <Panel
              title={detail.name}
              intro={
                canEdit
                  ? 'Change anything, then save: the amounts are worked out again.'
                  : 'Only the host changes a recipe.'
              }
            >
              {bases.data && pots.data && stocks.data && dyes.data && images.data ? (
                <ColorwayEditor
                  key={detail.id}
                  slug={slug}
                  colorway={detail}
                  canEdit={canEdit}
                  choices={{
                    bases: bases.data.items,
                    pots: pots.data.items,
                    stocks: stocks.data.items,
                    dyes: dyes.data.items,
                    images: images.data.items,
                  }}
                />
              ) : choiceFailure ? (
                <ErrorPanel
                  title="The shelf and bases could not be loaded"
                  error={choiceFailure.error ?? { message: 'Unknown problem.' }}
                  onRetry={() => void choiceFailure.refetch()}
                />
              ) : (
                <LoadingBlock label="Reading the shelf and bases…" />
              )}
            </Panel>
            <div className="space-y-6">
              <Panel
                title="Amounts"
                intro="Worked out by Vatside from the saved recipe."
                actions={<SystemSwitch system={system} onChange={setSystem} />}
              >
                <AmountsView
                  computed={detail.computed}
                  caption={`For your ${detail.skeinCount} skein${detail.skeinCount === 1 ? '' : 's'}`}
                />
                <SafetyNote />
              </Panel>
              <Panel title="Another skein" intro="The same recipe for a skein of any weight.">
                <OtherSkeinBox slug={slug} colorwayId={detail.id} system={system} />
              </Panel>
            </div>
            <div className="xl:col-span-2">
              <Panel
                title="Run sheet"
                intro={
                  canEdit ? 'Drag a step by its handle, or move it with the arrows.' : undefined
                }
              >
                <QueryView
                  query={steps}
                  loading="Reading the run sheet…"
                  failed="The run sheet could not be loaded"
                >
                  {(list) => (
                    <RunSheet
                      slug={slug}
                      colorwayId={detail.id}
                      steps={list.steps}
                      lines={lineAmountLabels(detail)}
                      canEdit={canEdit}
                      onEdit={(step, number) => setEditingStep({ step, number })}
                    />
                  )}
                </QueryView>
                {canEdit ? (
                  <ChangeOrAddSection
                    editing={editingStep}
                    changeTitle={({ number }) => `Change step ${number}`}
                    addTitle="Add a step"
                    form={(step) => (
                      <StepForm
                        key={step?.step.id}
                        slug={slug}
                        colorwayId={detail.id}
                        lines={lineAmountLabels(detail)}
                        editing={step}
                        onDone={() => setEditingStep(undefined)}
                      />
                    )}
                  />
                ) : null}
              </Panel>
            </div>
          </div>
        )}
      </QueryView>
    </div>
  );
}
