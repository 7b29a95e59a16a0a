import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useHref } from 'react-router-dom';
import { authCall, authClient } from '../auth-client.ts';
import { Button } from '../Button.tsx';
import { FormAlert } from '../form/FormAlert.tsx';
import { formResolver } from '../form/form-resolver.ts';
import { showServerError } from '../form/server-errors.ts';
import { TextField } from '../form/TextField.tsx';
import { textLinkClass } from '../link-class.ts';
import { AccountFrame } from './AccountFrame.tsx';
import { addressSchema } from './schemas.ts';

export function ForgotPasswordScreen() {
  const redirectTo = useHref('/reset-password');
  const [sentTo, setSentTo] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({ resolver: formResolver(addressSchema), defaultValues: { email: '' } });

  const onSubmit = handleSubmit(async ({ email }) => {
    try {
      await authCall(authClient.requestPasswordReset({ email, redirectTo }));
      setSentTo(email);
    } catch (error) {
      showServerError(error, setError, ['email']);
    }
  });

  return (
    <AccountFrame
      title="Set a new password"
      intro="Tell us your address and we will mail you a link to choose a new password."
    >
      {sentTo ? (
        <FormAlert tone="done">
          If an account uses {sentTo}, a link is on its way. It works for one hour.
        </FormAlert>
      ) : (
        <form noValidate onSubmit={onSubmit} className="space-y-5">
          {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
          <TextField
            label="E-mail"
            type="email"
            autoComplete="email"
            error={errors.email?.message}
            {...register('email')}
          />
          <Button type="submit" size="hand" disabled={isSubmitting}>
            {isSubmitting ? 'Sending…' : 'Mail me a link'}
          </Button>
        </form>
      )}
      <Link to="/sign-in" className={textLinkClass}>
        Back to sign in
      </Link>
    </AccountFrame>
  );
}
