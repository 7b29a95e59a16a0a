import { ApiError } from '@vatside/ui/api-client.ts';
import { Button } from '@vatside/ui/Button';
import { FieldFrame, fieldInputClass } from '@vatside/ui/form/FieldFrame';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useState } from 'react';
import { useForm, type Path } from 'react-hook-form';
import { dyeAlongFormSchema, type DyeAlongFormValues } from '../form-values.ts';
import { ColorwayPicker, type ColorwayChoice } from './ColorwayPicker.tsx';
import { InspirationPicker, type ImageChoice } from './InspirationPicker.tsx';
import { PrepItemsFields } from './PrepItemsFields.tsx';
import { StartFields } from './StartFields.tsx';

// The server names instants; the form holds them as wall-clock fields.
const serverFieldNames: Record<string, Path<DyeAlongFormValues>> = {
  startsAt: 'startsAtLocal',
  shareOpensAt: 'shareOpensLocal',
  shareClosesAt: 'shareClosesLocal',
};
const formFieldNames = Object.keys(dyeAlongFormSchema.shape) as Path<DyeAlongFormValues>[];

/** Create or edit a dye-along: what, when, the month's colorways and inspiration, the prep. */
export function DyeAlongForm({
  initial,
  colorwayChoices,
  imageChoices,
  submitLabel,
  busyLabel,
  onSave,
}: {
  initial: DyeAlongFormValues;
  colorwayChoices: ColorwayChoice[];
  imageChoices: ImageChoice[];
  submitLabel: string;
  busyLabel: string;
  /** Resolves with a note to show after saving, or nothing when the screen moves on. */
  onSave: (values: DyeAlongFormValues) => Promise<string | void>;
}) {
  const [done, setDone] = useState<string>();
  const {
    register,
    control,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: formResolver(dyeAlongFormSchema), defaultValues: initial });

  const onSubmit = handleSubmit(async (values) => {
    setDone(undefined);
    try {
      const note = await onSave(values);
      if (note) {
        reset(values);
        setDone(note);
      }
    } catch (error) {
      if (error instanceof ApiError && error.fields) {
        for (const [name, messages] of Object.entries(error.fields)) {
          const field = serverFieldNames[name] ?? (name.split('.')[0] as Path<DyeAlongFormValues>);
          if (formFieldNames.includes(field)) setError(field, { message: messages.join(' ') });
        }
      }
      setError('root.server', {
        message: error instanceof Error ? error.message : 'That did not save. Please try again.',
      });
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-8">
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      {done ? <FormAlert tone="done">{done}</FormAlert> : null}
      <fieldset className="space-y-4">
        <legend className="text-xl font-bold">What</legend>
        <TextField label="Title" error={errors.title?.message} {...register('title')} />
        <FieldFrame
          label="Description"
          hint="What viewers dye this month and anything they should know first."
          error={errors.description?.message}
        >
          {(frame) => (
            <textarea
              rows={4}
              className={`${fieldInputClass} py-3`}
              {...frame}
              {...register('description')}
            />
          )}
        </FieldFrame>
        <TextField
          label="Stream link"
          type="url"
          inputMode="url"
          placeholder="https://"
          hint="Where the video runs; viewers open it from their page."
          error={errors.streamUrl?.message}
          {...register('streamUrl')}
        />
      </fieldset>
      <StartFields control={control} register={register} errors={errors} />
      <InspirationPicker control={control} choices={imageChoices} />
      <ColorwayPicker control={control} choices={colorwayChoices} />
      <fieldset className="space-y-3">
        <legend className="text-xl font-bold">Sharing window</legend>
        <p className="text-vat-800">
          When viewers may share photos of their skeins, on the same clock as the start. Leave it
          empty to open sharing by hand later.
        </p>
        <div className="grid gap-4 md:grid-cols-2">
          <TextField
            label="Sharing opens"
            type="datetime-local"
            error={errors.shareOpensLocal?.message}
            {...register('shareOpensLocal')}
          />
          <TextField
            label="Sharing closes"
            type="datetime-local"
            error={errors.shareClosesLocal?.message}
            {...register('shareClosesLocal')}
          />
        </div>
      </fieldset>
      <PrepItemsFields control={control} register={register} errors={errors} />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? busyLabel : submitLabel}
      </Button>
    </form>
  );
}
