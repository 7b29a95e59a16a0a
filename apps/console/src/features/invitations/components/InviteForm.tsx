import { invitationCreateSchema } from '@vatside/contracts/members';
import { Button } from '@vatside/ui/Button';
import { FormAlert } from '@vatside/ui/form/FormAlert';
import { formResolver } from '@vatside/ui/form/form-resolver.ts';
import { showServerError } from '@vatside/ui/form/server-errors.ts';
import { TextField } from '@vatside/ui/form/TextField';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useInvite } from '../api.ts';

export function InviteForm({ slug }: { slug: string }) {
  const invite = useInvite(slug);
  const [sentTo, setSentTo] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: formResolver(invitationCreateSchema), defaultValues: { email: '' } });

  const onSubmit = handleSubmit(async (values) => {
    setSentTo(undefined);
    try {
      const invitation = await invite.mutateAsync(values);
      reset();
      setSentTo(invitation.email);
    } catch (error) {
      showServerError(error, setError, ['email']);
    }
  });

  return (
    <form noValidate onSubmit={onSubmit} className="max-w-xl space-y-3">
      {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
      <TextField
        label="Moderator’s e-mail"
        hint="They get a link that works once, for a week."
        type="email"
        autoComplete="off"
        error={errors.email?.message}
        {...register('email')}
      />
      <Button type="submit" disabled={isSubmitting}>
        {isSubmitting ? 'Sending…' : 'Send invitation'}
      </Button>
      {sentTo ? <FormAlert tone="done">Invitation sent to {sentTo}.</FormAlert> : null}
    </form>
  );
}
