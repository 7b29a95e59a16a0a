import { profileUpdateSchema, type Profile } from '@vatside/contracts/account';
import { convert } from '@vatside/dye-kit';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Button } from '../Button.tsx';
import { cx } from '../cx.ts';
import { FormAlert } from '../form/FormAlert.tsx';
import { formResolver } from '../form/form-resolver.ts';
import { SelectField } from '../form/SelectField.tsx';
import { showServerError } from '../form/server-errors.ts';
import { TextField } from '../form/TextField.tsx';
import { useUpdateProfile } from './profile-api.ts';
import { deviceTimeZone, timeZoneChoices } from './time-zones.ts';

const ounces = new Intl.NumberFormat('en-US', { maximumFractionDigits: 1 });

const unitChoices = [
  { value: 'us', label: 'US', detail: 'ounces, teaspoons, cups, °F' },
  { value: 'metric', label: 'Metric', detail: 'grams, milliliters, °C' },
] as const;

export function ProfileForm({ profile }: { profile: Profile }) {
  const update = useUpdateProfile();
  const [saved, setSaved] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    watch,
    reset,
    formState: { errors, isSubmitting, isDirty },
  } = useForm({
    resolver: formResolver(profileUpdateSchema),
    defaultValues: editable(profile),
  });
  const device = deviceTimeZone();
  const zone = watch('timeZone') ?? profile.timeZone;
  const grams = watch('defaultSkeinWeightG');

  const onSubmit = handleSubmit(async (changes) => {
    setSaved(false);
    try {
      reset(editable(await update.mutateAsync(changes)));
      setSaved(true);
    } catch (error) {
      showServerError(error, setError, ['name', 'timeZone', 'unitSystem', 'defaultSkeinWeightG']);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-6">
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <TextField
        label="Display name"
        hint="Studios and other dyers see this name."
        autoComplete="name"
        error={errors.name?.message}
        {...register('name')}
      />
      <div className="space-y-2">
        <SelectField
          label="Time zone"
          hint="Dye-along start times show in this zone."
          error={errors.timeZone?.message}
          {...register('timeZone')}
        >
          {timeZoneChoices(zone).map((choice) => (
            <option key={choice} value={choice}>
              {choice.replaceAll('_', ' ')}
            </option>
          ))}
        </SelectField>
        {zone !== device ? (
          <Button
            variant="secondary"
            onClick={() => setValue('timeZone', device, { shouldDirty: true })}
          >
            Use this device’s zone ({device.replaceAll('_', ' ')})
          </Button>
        ) : null}
      </div>
      <fieldset className="space-y-2">
        <legend className="font-bold">Units for amounts</legend>
        <div className="grid gap-3 sm:grid-cols-2">
          {unitChoices.map((choice) => (
            <label
              key={choice.value}
              className={cx(
                'flex min-h-16 cursor-pointer items-center gap-3 rounded-xl border-2 border-vat-800 bg-white px-4',
                'has-checked:bg-vat-100 has-focus-visible:outline-3 has-focus-visible:outline-offset-3 has-focus-visible:outline-vat-700',
              )}
            >
              <input
                type="radio"
                value={choice.value}
                className="size-6 accent-vat-800"
                {...register('unitSystem')}
              />
              <span>
                <span className="block font-bold">{choice.label}</span>
                <span className="block text-sm text-vat-800">{choice.detail}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <TextField
        label="My usual skein weight (grams)"
        hint="Recipes scale to this weight unless you pick another."
        type="number"
        inputMode="numeric"
        min={5}
        max={2000}
        step={1}
        className="max-w-xs"
        suffix={
          typeof grams === 'number' && grams > 0
            ? `g ≈ ${ounces.format(convert(grams, 'g', 'oz'))} oz`
            : 'g'
        }
        error={errors.defaultSkeinWeightG?.message}
        {...register('defaultSkeinWeightG', { valueAsNumber: true })}
      />
      <div className="flex flex-wrap items-center gap-4">
        <Button type="submit" disabled={isSubmitting || !isDirty}>
          {isSubmitting ? 'Saving…' : 'Save profile'}
        </Button>
        {saved && !isDirty ? <FormAlert tone="done">Profile saved.</FormAlert> : null}
      </div>
    </form>
  );
}

function editable({ name, timeZone, unitSystem, defaultSkeinWeightG }: Profile) {
  return { name, timeZone, unitSystem, defaultSkeinWeightG };
}
