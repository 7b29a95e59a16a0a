import { useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { ApiError } from '../api-client.ts';
import { authCall, authClient } from '../auth-client.ts';
import { Button } from '../Button.tsx';
import { FormAlert } from '../form/FormAlert.tsx';
import { formResolver } from '../form/form-resolver.ts';
import { showServerError } from '../form/server-errors.ts';
import { TextField } from '../form/TextField.tsx';
import { textLinkClass } from '../link-class.ts';
import { meQueryOptions } from '../session.ts';
import { AccountFrame } from './AccountFrame.tsx';
import { safeNext, withNext } from './next-path.ts';
import { ResendLink } from './ResendLink.tsx';
import { signInSchema } from './schemas.ts';

export function SignInScreen() {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const navigate = useNavigate();
  const queryClient = useQueryClient();
  // Set when the address is still waiting for its confirmation link.
  const [unconfirmed, setUnconfirmed] = useState<string>();
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(signInSchema),
    defaultValues: { email: params.get('email') ?? '', password: '' },
  });

  const onSubmit = handleSubmit(async ({ email, password }) => {
    setUnconfirmed(undefined);
    try {
      await authCall(authClient.signIn.email({ email, password }));
    } catch (error) {
      if (error instanceof ApiError && error.code === 'EMAIL_NOT_VERIFIED') {
        setUnconfirmed(email);
        return;
      }
      showServerError(error, setError, ['email', 'password']);
      return;
    }
    // Everything cached so far was fetched as a visitor. Who is here must be known before
    // moving on (guarded screens would send the person back), the rest can follow.
    await queryClient.invalidateQueries({ queryKey: meQueryOptions().queryKey });
    void queryClient.invalidateQueries({ predicate: (query) => query.queryKey[0] !== 'me' });
    navigate(next ?? '/', { replace: true });
  });

  return (
    <AccountFrame title="Sign in" intro="Welcome back. Your studios and skeins are waiting.">
      <form noValidate onSubmit={onSubmit} className="space-y-5">
        {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
        {unconfirmed ? (
          <div
            role="alert"
            className="space-y-2 rounded-xl border-2 border-marigold-500 bg-marigold-100 p-4"
          >
            <p className="font-bold">Confirm your address first</p>
            <p>
              We sent a link to {unconfirmed}. Open it, then sign in here. No mail after a few
              minutes? Look in the spam folder, or ask for a new link.
            </p>
            <ResendLink email={unconfirmed} next={next} />
          </div>
        ) : null}
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          error={errors.email?.message}
          {...register('email')}
        />
        <TextField
          label="Password"
          type="password"
          autoComplete="current-password"
          error={errors.password?.message}
          {...register('password')}
        />
        <Button type="submit" size="hand" disabled={isSubmitting}>
          {isSubmitting ? 'Signing in…' : 'Sign in'}
        </Button>
      </form>
      <nav aria-label="Other ways in" className="flex flex-wrap gap-x-6">
        <Link to={withNext('/sign-up', next)} className={textLinkClass}>
          New here? Create an account
        </Link>
        <Link to="/forgot-password" className={textLinkClass}>
          Forgot your password?
        </Link>
      </nav>
    </AccountFrame>
  );
}
