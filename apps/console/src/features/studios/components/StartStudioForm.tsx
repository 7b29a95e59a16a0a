import { studioCreateSchema } from '@vatside/contracts/studios';
import { ApiError } from '@vatside/ui/api-client.ts';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { useStartStudio } from '../api.ts';

/** "Saltmarsh Vats & Co." → "saltmarsh-vats-co" */
function slugFrom(name: string) {
  return name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, 64);
}

export function StartStudioForm() {
  const start = useStartStudio();
  const navigate = useNavigate();
  const {
    register,
    handleSubmit,
    setError,
    setValue,
    getFieldState,
    watch,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(studioCreateSchema),
    defaultValues: { name: '', slug: '', tagline: '', accentHex: '#1d5566' },
  });
  const accentHex = watch('accentHex');

  const onSubmit = handleSubmit(async (studio) => {
    try {
      const created = await start.mutateAsync(studio);
      navigate(`/studios/${created.slug}/members`);
    } catch (error) {
      if (error instanceof ApiError && error.code === 'CONFLICT' && !error.fields) {
        setError('slug', { message: error.message });
        return;
      }
      showServerError(error, setError, ['name', 'slug', 'tagline', 'accentHex']);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="space-y-5">
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <TextField
        label="Studio name"
        error={errors.name?.message}
        {...register('name', {
          // Suggest an address from the name until the host types their own.
          onChange: (event: { target: { value: string } }) => {
            if (!getFieldState('slug').isDirty) setValue('slug', slugFrom(event.target.value));
          },
        })}
      />
      <TextField
        label="Web address"
        hint="Lowercase letters, digits and dashes. Your public page: /s/your-address"
        error={errors.slug?.message}
        autoCapitalize="none"
        spellCheck={false}
        {...register('slug')}
      />
      <TextField
        label="Tagline"
        hint="One line that tells dyers what your studio is about. Optional."
        error={errors.tagline?.message}
        {...register('tagline')}
      />
      <div className="space-y-1">
        <label htmlFor="studio-accent" className="block font-bold">
          Studio color
        </label>
        <div className="flex items-center gap-3">
          <input
            id="studio-accent"
            type="color"
            className="h-12 w-24 cursor-pointer rounded-lg border-2 border-vat-800 bg-white"
            {...register('accentHex')}
          />
          <span className="font-bold uppercase">{accentHex}</span>
        </div>
        {errors.accentHex ? (
          <p className="font-bold text-madder-700">{errors.accentHex.message}</p>
        ) : null}
      </div>
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Starting…' : 'Start the studio'}
      </Button>
    </form>
  );
}
