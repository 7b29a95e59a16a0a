import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useSearchParams } from 'react-router-dom';
import { authCall, authClient } from '../auth-client.ts';
import { Button, buttonClass } from '../Button.tsx';
import { FormAlert } from '../form/FormAlert.tsx';
import { formResolver } from '../form/form-resolver.ts';
import { showServerError } from '../form/server-errors.ts';
import { TextField } from '../form/TextField.tsx';
import { AccountFrame } from './AccountFrame.tsx';
import { PASSWORD_MIN_LENGTH, setPasswordSchema } from './schemas.ts';

/** The mailed reset link lands here with `?token=` (or `?error=INVALID_TOKEN`). */
export function ResetPasswordScreen() {
  const [params] = useSearchParams();
  const token = params.get('token');
  const [done, setDone] = useState(false);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(setPasswordSchema),
    defaultValues: { newPassword: '', repeatPassword: '' },
  });

  if (!token || params.get('error')) {
    return (
      <AccountFrame title="That link has run dry">
        <p className="text-lg">
          The link to set a new password is too old or was used already. Ask for a fresh one.
        </p>
        <Link to="/forgot-password" className={buttonClass('primary', 'hand')}>
          Mail me a new link
        </Link>
      </AccountFrame>
    );
  }

  if (done) {
    return (
      <AccountFrame title="Password changed">
        <p className="text-lg">Sign in with your new password on each of your devices.</p>
        <Link to="/sign-in" className={buttonClass('primary', 'hand')}>
          Sign in
        </Link>
      </AccountFrame>
    );
  }

  const onSubmit = handleSubmit(async ({ newPassword }) => {
    try {
      await authCall(authClient.resetPassword({ newPassword, token }));
      setDone(true);
    } catch (error) {
      showServerError(error, setError, ['newPassword']);
    }
  });

  return (
    <AccountFrame title="Choose a new password">
      <form noValidate onSubmit={onSubmit} className="space-y-5">
        {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
        <TextField
          label="New password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          type="password"
          autoComplete="new-password"
          error={errors.newPassword?.message}
          {...register('newPassword')}
        />
        <TextField
          label="New password again"
          type="password"
          autoComplete="new-password"
          error={errors.repeatPassword?.message}
          {...register('repeatPassword')}
        />
        <Button type="submit" size="hand" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : 'Save new password'}
        </Button>
      </form>
    </AccountFrame>
  );
}
