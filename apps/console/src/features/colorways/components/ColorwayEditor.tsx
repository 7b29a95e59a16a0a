import type { Base, Pot } from '@vatside/contracts/workbench-bases';
import {
  techniques,
  type ColorwaySummary,
  type ColorwayUpdate,
} from '@vatside/contracts/workbench-colorways';
import type { Image } from '@vatside/contracts/workbench-images';
import type { Dye, StockSolution } from '@vatside/contracts/workbench-shelf';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { SelectField } from '@vatside/ui/form/SelectField';
import { FieldFrame, fieldInputClass } from '@vatside/ui/form/FieldFrame';
import { TextField } from '@vatside/ui/form/TextField';
import { useState } from 'react';
import { FormProvider, useFieldArray, useForm, type Path } from 'react-hook-form';
import { useUpdateColorway } from '../api.ts';
import { blankLine, colorwayResolver, toDraft, type ColorwayDraft } from './colorway-draft.ts';
import { techniqueNames } from './names.ts';
import { RecipeLineFields } from './RecipeLineFields.tsx';
import { TargetSwatches } from './TargetSwatches.tsx';

export type ColorwayChoices = {
  bases: Base[];
  pots: Pot[];
  stocks: StockSolution[];
  dyes: Dye[];
  images: Image[];
};

/** Everything the host writes about a colorway; the server answers with the amounts. */
export function ColorwayEditor({
  slug,
  colorway,
  choices,
  canEdit,
}: {
  slug: string;
  colorway: ColorwaySummary;
  choices: ColorwayChoices;
  canEdit: boolean;
}) {
  const update = useUpdateColorway(slug, colorway.id);
  const [saved, setSaved] = useState(false);
  const form = useForm<ColorwayDraft>({
    resolver: colorwayResolver,
    defaultValues: toDraft(colorway),
  });
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    watch,
    formState: { errors, isSubmitting, isDirty },
  } = form;
  const lines = useFieldArray({ control, name: 'recipeLines' });
  const acid = watch('acid.acid');
  const potId = watch('potId');
  const aluminum = choices.pots.find((p) => p.id === potId)?.reactsWithAcid;

  const onSubmit = handleSubmit(async (body) => {
    setSaved(false);
    try {
      // The resolver hands over the API body, already checked by the shared schema.
      reset(toDraft(await update.mutateAsync(body as unknown as ColorwayUpdate)));
      setSaved(true);
    } catch (error) {
      const fields = error instanceof ApiError ? Object.keys(error.fields ?? {}) : [];
      for (const field of fields) {
        setError(field as Path<ColorwayDraft>, {
          message: (error as ApiError).fields?.[field]?.join(' ') ?? '',
        });
      }
      setError('root.server', {
        message: error instanceof Error ? error.message : 'Saving failed.',
      });
    }
  });

  return (
    <FormProvider {...form}>
      <form noValidate onSubmit={onSubmit} aria-label="Colorway recipe" className="space-y-6">
        <fieldset disabled={!canEdit} className="min-w-0 space-y-6">
          <div className="grid gap-4 sm:grid-cols-2">
            <TextField label="Colorway name" error={errors.name?.message} {...register('name')} />
            <SelectField
              label="Technique"
              error={errors.technique?.message}
              {...register('technique')}
            >
              {techniques.map((t) => (
                <option key={t} value={t}>
                  {techniqueNames[t]}
                </option>
              ))}
            </SelectField>
            <SelectField label="Base" error={errors.baseId?.message} {...register('baseId')}>
              <option value="">No base chosen</option>
              {choices.bases.map((b) => (
                <option key={b.id} value={b.id}>
                  {b.name}
                </option>
              ))}
            </SelectField>
            <SelectField label="Pot" error={errors.potId?.message} {...register('potId')}>
              <option value="">No pot chosen</option>
              {choices.pots.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name}
                  {p.reactsWithAcid ? ' (aluminum)' : ''}
                </option>
              ))}
            </SelectField>
            <TextField
              label="Skeins in the pot"
              type="number"
              inputMode="numeric"
              error={errors.skeinCount?.message}
              {...register('skeinCount')}
            />
            <TextField
              label="Dry weight of one skein"
              type="number"
              inputMode="decimal"
              step="any"
              suffix="g"
              error={errors.weightOfGoodsG?.message}
              {...register('weightOfGoodsG')}
            />
          </div>
          {aluminum ? (
            <FormAlert>This pot is aluminum: it reacts with the acid in the bath.</FormAlert>
          ) : null}

          <TargetSwatches images={choices.images} canEdit={canEdit} />

          <section aria-label="Recipe lines" className="space-y-3">
            <h3 className="text-xl font-bold">Recipe lines</h3>
            {lines.fields.length === 0 ? (
              <p className="text-vat-800">No dye in this recipe yet.</p>
            ) : null}
            {lines.fields.map((field, index) => (
              <RecipeLineFields
                key={field.id}
                index={index}
                stocks={choices.stocks}
                dyes={choices.dyes}
                canEdit={canEdit}
                onRemove={() => lines.remove(index)}
              />
            ))}
            {errors.recipeLines?.message ? (
              <FormAlert>{errors.recipeLines.message}</FormAlert>
            ) : null}
            {canEdit ? (
              <div className="flex flex-wrap gap-2">
                <Button variant="secondary" onClick={() => lines.append(blankLine('stock'))}>
                  Add a stock solution line
                </Button>
                <Button variant="secondary" onClick={() => lines.append(blankLine('foodColor'))}>
                  Add a food color line
                </Button>
              </div>
            ) : null}
          </section>

          <section aria-label="Bath" className="space-y-3">
            <h3 className="text-xl font-bold">Bath</h3>
            <div className="grid gap-4 sm:grid-cols-2">
              <TextField
                label="Liquor ratio"
                hint="Water to dry fiber by weight: 30 means 30:1."
                type="number"
                inputMode="decimal"
                step="any"
                suffix=": 1"
                error={errors.liquorRatio?.message}
                {...register('liquorRatio')}
              />
              <SelectField label="Acid" {...register('acid.acid')}>
                <option value="vinegar">Vinegar</option>
                <option value="citric">Citric acid</option>
              </SelectField>
              {acid === 'vinegar' ? (
                <TextField
                  label="Vinegar strength"
                  hint="Table vinegar is commonly 5 %."
                  type="number"
                  inputMode="decimal"
                  step="any"
                  suffix="% acetic"
                  error={
                    errors.acid && 'acidStrengthPct' in errors.acid
                      ? errors.acid.acidStrengthPct?.message
                      : undefined
                  }
                  {...register('acid.acidStrengthPct')}
                />
              ) : null}
              <TextField
                label="Your own acid amount (optional)"
                hint="Leave blank to use the common-practice rule."
                type="number"
                inputMode="decimal"
                step="any"
                suffix="mL"
                error={errors.acid?.amountMl?.message}
                {...register('acid.amountMl')}
              />
            </div>
          </section>

          <FieldFrame label="Notes" error={errors.notes?.message}>
            {(control) => (
              <textarea
                rows={4}
                className={`${fieldInputClass} py-2`}
                {...control}
                {...register('notes')}
              />
            )}
          </FieldFrame>
        </fieldset>
        {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
        {saved && !isDirty ? (
          <FormAlert tone="done">Saved. The amounts below are worked out again.</FormAlert>
        ) : null}
        {canEdit ? (
          // Always in reach while scrolling a long recipe.
          <div className="sticky bottom-0 -mx-5 border-t-2 border-wool-200 bg-wool-50/95 px-5 py-3 sm:-mx-6 sm:px-6">
            <Button type="submit" size="hand" className="sm:w-auto" disabled={isSubmitting}>
              {isSubmitting ? 'Saving…' : 'Save recipe'}
            </Button>
          </div>
        ) : null}
      </form>
    </FormProvider>
  );
}
