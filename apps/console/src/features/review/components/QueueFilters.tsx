import type { DyeAlong } from '@vatside/contracts/dye-alongs';
import { submissionStatuses, type SubmissionStatus } from '@vatside/contracts/submissions';
import { SelectField } from '@vatside/ui/form/SelectField';
import { statusNames } from '../names.ts';

/** Which month's skeins, and in which status; "every dye-along" when none is chosen. */
export function MonthFilter({
  months,
  value,
  onChange,
}: {
  months: DyeAlong[];
  value: string | undefined;
  onChange: (dyeAlongId: string | undefined) => void;
}) {
  return (
    <SelectField
      label="Dye-along"
      value={value ?? ''}
      onChange={(e) => onChange(e.target.value || undefined)}
    >
      <option value="">Every dye-along</option>
      {months.map((m) => (
        <option key={m.id} value={m.id}>
          {m.title}
        </option>
      ))}
    </SelectField>
  );
}

export function StatusFilter({
  value,
  onChange,
}: {
  value: SubmissionStatus;
  onChange: (status: SubmissionStatus) => void;
}) {
  return (
    <SelectField
      label="Status"
      value={value}
      onChange={(e) => onChange(e.target.value as SubmissionStatus)}
    >
      {submissionStatuses.map((s) => (
        <option key={s} value={s}>
          {statusNames[s]}
        </option>
      ))}
    </SelectField>
  );
}
