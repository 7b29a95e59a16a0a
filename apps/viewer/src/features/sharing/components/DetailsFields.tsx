import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import { FieldFrame, fieldInputClass } from '@vatside/ui/form/FieldFrame';
import type { DetailErrors, DetailsDraft } from '../details.ts';
import { FiberRows } from './FiberRows.tsx';

/** Colorway, base, fiber, dyes and notes: the same fields when sharing and when editing. */
export function DetailsFields({
  draft,
  onChange,
  errors,
  colorways,
}: {
  draft: DetailsDraft;
  onChange: (draft: DetailsDraft) => void;
  errors: DetailErrors & { colorwayId?: string };
  /** The month's colorways; none leaves the choice out. */
  colorways: { colorwayId: string; name: string }[];
}) {
  const set = (part: Partial<DetailsDraft>) => onChange({ ...draft, ...part });
  return (
    <div className="space-y-5">
      {colorways.length > 0 ? (
        <SelectField
          label="Which colorway inspired it?"
          hint="Optional."
          value={draft.colorwayId}
          error={errors.colorwayId}
          onChange={(e) => set({ colorwayId: e.target.value })}
        >
          <option value="">My own idea</option>
          {colorways.map((c) => (
            <option key={c.colorwayId} value={c.colorwayId}>
              {c.name}
            </option>
          ))}
        </SelectField>
      ) : null}
      <TextField
        label="Yarn base"
        hint="What the skein is, e.g. “merino sock, 100 g”."
        value={draft.baseName}
        maxLength={120}
        autoComplete="off"
        error={errors.baseName}
        onChange={(e) => set({ baseName: e.target.value })}
      />
      <FiberRows
        rows={draft.fibers}
        onChange={(fibers) => set({ fibers })}
        error={errors.fiberContent}
      />
      <TextField
        label="Dyes used"
        hint="Separate them with commas, e.g. “teal gel, blue liquid, vinegar”."
        value={draft.dyes}
        autoComplete="off"
        error={errors.dyesUsed}
        onChange={(e) => set({ dyes: e.target.value })}
      />
      <FieldFrame
        label="Notes"
        hint="Optional: what you did, what surprised you."
        error={errors.notes}
      >
        {(control) => (
          <textarea
            {...control}
            rows={4}
            maxLength={2_000}
            value={draft.notes}
            onChange={(e) => set({ notes: e.target.value })}
            className={`${fieldInputClass} py-3`}
          />
        )}
      </FieldFrame>
    </div>
  );
}
