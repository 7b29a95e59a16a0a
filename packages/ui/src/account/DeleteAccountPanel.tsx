import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { useNavigate } from 'react-router-dom';
import { ApiError } from '../api-client.ts';
import { authCall, authClient } from '../auth-client.ts';
import { Button } from '../Button.tsx';
import { Card } from '../Card.tsx';
import { FormAlert } from '../form/FormAlert.tsx';
import { formResolver } from '../form/form-resolver.ts';
import { showServerError } from '../form/server-errors.ts';
import { TextField } from '../form/TextField.tsx';
import { forgetSession } from '../session.ts';
import { deleteAccountSchema } from './schemas.ts';

export function DeleteAccountPanel() {
  const [open, setOpen] = useState(false);
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  const {
    register,
    handleSubmit,
    setError,
    reset,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: formResolver(deleteAccountSchema), defaultValues: { password: '' } });

  const onSubmit = handleSubmit(async ({ password }) => {
    try {
      await authCall(authClient.deleteUser({ password }));
    } catch (error) {
      if (error instanceof ApiError && error.code === 'INVALID_PASSWORD') {
        setError('password', { message: 'That password is not right.' });
      } else {
        // e.g. "You are the only host of …": the server's words say what to do.
        showServerError(error, setError, ['password']);
      }
      return;
    }
    navigate('/account-deleted', { replace: true });
    forgetSession(queryClient);
  });

  return (
    <Card
      as="section"
      aria-labelledby="delete-account-title"
      className="space-y-4 border-madder-700"
    >
      <h2 id="delete-account-title" className="font-display text-2xl font-semibold">
        Delete my account
      </h2>
      <p>
        This removes your profile, your sign-in and your place in every studio. It cannot be undone.
        If you are the only host of a studio, make someone else a host first.
      </p>
      {open ? (
        <form noValidate onSubmit={onSubmit} className="space-y-4">
          {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
          <TextField
            label="Your password, to confirm"
            type="password"
            autoComplete="current-password"
            error={errors.password?.message}
            autoFocus
            {...register('password')}
          />
          <div className="flex flex-wrap gap-3">
            <Button type="submit" variant="danger" disabled={isSubmitting}>
              {isSubmitting ? 'Deleting…' : 'Delete my account for good'}
            </Button>
            <Button
              variant="secondary"
              onClick={() => {
                reset();
                setOpen(false);
              }}
            >
              Keep my account
            </Button>
          </div>
        </form>
      ) : (
        <Button variant="secondary" onClick={() => setOpen(true)}>
          Delete my account…
        </Button>
      )}
    </Card>
  );
}
