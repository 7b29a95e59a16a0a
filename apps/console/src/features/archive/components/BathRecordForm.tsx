import type { BathRecord, BathRecordInput } from '@vatside/contracts/archive';
import type { Image } from '@vatside/contracts/workbench-images';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Button } from '@vatside/ui/Button';
import { FieldFrame, fieldInputClass } from '@vatside/ui/form/FieldFrame';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { SelectField } from '@vatside/ui/form/SelectField';
import { TextField } from '@vatside/ui/form/TextField';
import { formatMl, formatQuantity } from '@vatside/ui/supplies/format.ts';
import { useState, type FormEvent } from 'react';
import { useSaveBathRecord } from '../api.ts';

const numberOrNull = (data: FormData, name: string) => {
  const raw = String(data.get(name) ?? '').trim();
  return raw === '' ? null : Number(raw);
};

/** "Brinewell Blue: BB-77" per line → dye lots. */
const parseLots = (text: string) =>
  text
    .split('\n')
    .map((line) => line.split(':'))
    .filter((parts) => parts.length >= 2 && parts[0]!.trim() && parts.slice(1).join(':').trim())
    .map((parts) => ({ dyeName: parts[0]!.trim(), lot: parts.slice(1).join(':').trim() }));

const exhaustedValue = (v: boolean | null) => (v === null ? '' : v ? 'yes' : 'no');

/** The host's record of one colorway's bath after the live session. */
export function BathRecordForm({
  slug,
  dyeAlongId,
  record,
  photos,
}: {
  slug: string;
  dyeAlongId: string;
  record: BathRecord;
  photos: Image[];
}) {
  const save = useSaveBathRecord(slug, dyeAlongId, record.colorwayId);
  const [fields, setFields] = useState<Record<string, string[]>>({});
  const [message, setMessage] = useState<{ tone: 'done' | 'problem'; text: string }>();
  const field = (name: string) => fields[name]?.join(' ');

  const submit = async (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const data = new FormData(event.currentTarget);
    const exhausted = String(data.get('bathExhausted'));
    const body: BathRecordInput = {
      fiberWeightDyedG: numberOrNull(data, 'fiberWeightDyedG'),
      bathVolumeMl: numberOrNull(data, 'bathVolumeMl'),
      temperatureReachedC: numberOrNull(data, 'temperatureReachedC'),
      timeAtTemperatureMin: numberOrNull(data, 'timeAtTemperatureMin'),
      bathExhausted: exhausted === '' ? null : exhausted === 'yes',
      baseLot: String(data.get('baseLot') ?? ''),
      dyeLots: parseLots(String(data.get('dyeLots') ?? '')),
      photoImageIds: data.getAll('photoImageIds').map(String),
      notes: String(data.get('notes') ?? ''),
    };
    try {
      await save.mutateAsync(body);
      setFields({});
      setMessage({ tone: 'done', text: `Saved the bath record of ${record.colorwayName}.` });
    } catch (error) {
      setFields(error instanceof ApiError && error.fields ? error.fields : {});
      setMessage({
        tone: 'problem',
        text: error instanceof Error ? error.message : 'The bath record could not be saved.',
      });
    }
  };

  return (
    <form
      noValidate
      onSubmit={(e) => void submit(e)}
      aria-label={`Bath record: ${record.colorwayName}`}
      className="space-y-4"
    >
      {message ? <FormAlert tone={message.tone}>{message.text}</FormAlert> : null}
      <div className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
        <TextField
          label="Dry fiber dyed (g)"
          hint={`Plan: ${formatQuantity(record.plannedFiberWeightG)} g. Weigh it dry; dye again works from this.`}
          name="fiberWeightDyedG"
          type="number"
          inputMode="decimal"
          step="any"
          defaultValue={record.fiberWeightDyedG ?? ''}
          error={field('fiberWeightDyedG')}
        />
        <TextField
          label="Bath volume (mL)"
          hint={`Plan: ${formatMl(record.plannedBathVolumeMl)}.`}
          name="bathVolumeMl"
          type="number"
          inputMode="decimal"
          step="any"
          defaultValue={record.bathVolumeMl ?? ''}
          error={field('bathVolumeMl')}
        />
        <TextField
          label="Temperature reached (°C)"
          name="temperatureReachedC"
          type="number"
          inputMode="decimal"
          step="any"
          defaultValue={record.temperatureReachedC ?? ''}
          error={field('temperatureReachedC')}
        />
        <TextField
          label="Time at temperature (min)"
          name="timeAtTemperatureMin"
          type="number"
          inputMode="numeric"
          step="1"
          defaultValue={record.timeAtTemperatureMin ?? ''}
          error={field('timeAtTemperatureMin')}
        />
        <SelectField
          label="Did the bath exhaust?"
          hint="The water clears when the yarn has taken up the dye."
          name="bathExhausted"
          defaultValue={exhaustedValue(record.bathExhausted)}
        >
          <option value="">Not noted</option>
          <option value="yes">Yes, the water cleared</option>
          <option value="no">No, color stayed in the water</option>
        </SelectField>
        <TextField
          label="Base lot"
          name="baseLot"
          maxLength={40}
          defaultValue={record.baseLot}
          error={field('baseLot')}
        />
      </div>
      <FieldFrame
        label="Dye lots"
        hint="One per line, as “dye: lot”, e.g. “Brinewell Blue: BB-0415”."
        error={field('dyeLots')}
      >
        {(control) => (
          <textarea
            {...control}
            name="dyeLots"
            rows={3}
            className={`${fieldInputClass} py-2`}
            defaultValue={record.dyeLots.map((d) => `${d.dyeName}: ${d.lot}`).join('\n')}
          />
        )}
      </FieldFrame>
      <fieldset className="space-y-2">
        <legend className="font-bold">Photos of the finished skeins</legend>
        {photos.length === 0 ? (
          <p className="text-vat-800">
            No colorway photos yet: add them on the workbench, then pick them here.
          </p>
        ) : (
          <ul className="flex flex-wrap gap-4">
            {photos.map((photo, i) => (
              <li key={photo.id}>
                <label className="flex min-h-12 cursor-pointer items-center gap-3 rounded-xl border-2 border-wool-300 p-2">
                  <input
                    type="checkbox"
                    name="photoImageIds"
                    value={photo.id}
                    defaultChecked={record.photoImageIds.includes(photo.id)}
                    className="size-6"
                  />
                  <img
                    src={photo.thumbUrl}
                    alt={`Photo ${i + 1} of ${record.colorwayName}`}
                    className="h-16 w-auto rounded-lg"
                  />
                </label>
              </li>
            ))}
          </ul>
        )}
      </fieldset>
      <FieldFrame label="Notes" error={field('notes')}>
        {(control) => (
          <textarea
            {...control}
            name="notes"
            rows={3}
            maxLength={5000}
            className={`${fieldInputClass} py-2`}
            defaultValue={record.notes}
          />
        )}
      </FieldFrame>
      <Button type="submit" disabled={save.isPending}>
        {save.isPending ? 'Saving…' : `Save the bath record of ${record.colorwayName}`}
      </Button>
    </form>
  );
}
