import { deviceTimeZone, timeZoneChoices } from '@vatside/ui/account/time-zones.ts';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import { memo, useState } from 'react';
import { useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { DyeAlongFormValues } from '../form-values.ts';
import { clockLabel, existsIn, localPattern, localToIso } from '../zoned.ts';

/** A zone that is not the host's, so the check shows a real conversion. */
const otherZone = (hostZone: string) =>
  deviceTimeZone() !== hostZone
    ? deviceTimeZone()
    : hostZone === 'Asia/Tokyo'
      ? 'UTC'
      : 'Asia/Tokyo';

/** Some 400 zones: rendered once, not on every keystroke elsewhere in the form. */
const ZoneOptions = memo(function ZoneOptions({ current }: { current: string }) {
  return timeZoneChoices(current).map((zone) => (
    <option key={zone} value={zone}>
      {zone}
    </option>
  ));
});

/** The start as the host's wall clock, its zone, and the same moment elsewhere as a check. */
export function StartFields({
  control,
  register,
  errors,
}: {
  control: Control<DyeAlongFormValues>;
  register: UseFormRegister<DyeAlongFormValues>;
  errors: FieldErrors<DyeAlongFormValues>;
}) {
  const [startsAtLocal, timeZone] = useWatch({ control, name: ['startsAtLocal', 'timeZone'] });
  // Follows the form's zone until the host picks one, so the check never repeats the start.
  const [pickedZone, setPickedZone] = useState<string>();
  const checkZone = pickedZone ?? otherZone(timeZone);
  const iso =
    localPattern.test(startsAtLocal) && existsIn(startsAtLocal, timeZone)
      ? localToIso(startsAtLocal, timeZone)
      : null;
  return (
    <fieldset className="space-y-4">
      <legend className="text-xl font-bold">When</legend>
      <div className="grid gap-4 md:grid-cols-3">
        <TextField
          label="Starts at (on your clock)"
          type="datetime-local"
          error={errors.startsAtLocal?.message}
          {...register('startsAtLocal')}
        />
        <SelectField
          label="Time zone"
          hint="The clock the start is written on."
          error={errors.timeZone?.message}
          {...register('timeZone')}
        >
          <ZoneOptions current={timeZone} />
        </SelectField>
        <TextField
          label="Expected length"
          type="number"
          inputMode="numeric"
          step={5}
          suffix="min"
          error={errors.expectedLengthMin?.message}
          {...register('expectedLengthMin', { valueAsNumber: true })}
        />
      </div>
      <div className="space-y-3 rounded-xl border-2 border-vat-200 bg-vat-100 p-4">
        <p className="font-bold">The same moment elsewhere, as a check</p>
        {iso ? (
          <output className="block space-y-1" aria-live="polite">
            <span className="block">
              <span className="font-bold">UTC:</span> {clockLabel(iso, 'UTC')}
            </span>
            <span className="block">
              <span className="font-bold">{checkZone}:</span> {clockLabel(iso, checkZone)}
            </span>
          </output>
        ) : (
          <p>Pick a day and a time to see it on other clocks.</p>
        )}
        <SelectField
          label="Also show it in"
          className="max-w-sm"
          value={checkZone}
          onChange={(event) => setPickedZone(event.target.value)}
        >
          <ZoneOptions current={checkZone} />
        </SelectField>
      </div>
    </fieldset>
  );
}
