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
import { AccountFrame } from './AccountFrame.tsx';
import { safeNext, withNext } from './next-path.ts';
import { useConfirmedHref } from './ResendLink.tsx';
import { PASSWORD_MIN_LENGTH, signUpSchema } from './schemas.ts';
import { deviceTimeZone } from './time-zones.ts';

export function SignUpScreen() {
  const [params] = useSearchParams();
  const next = safeNext(params.get('next'));
  const navigate = useNavigate();
  const callbackURL = useConfirmedHref(next);
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = useForm({
    resolver: formResolver(signUpSchema),
    defaultValues: { name: '', email: params.get('email') ?? '', password: '' },
  });

  const onSubmit = handleSubmit(async ({ name, email, password }) => {
    try {
      await authCall(
        authClient.signUp.email({ name, email, password, timeZone: deviceTimeZone(), callbackURL }),
      );
    } catch (error) {
      // better-auth names the field in its code (e.g. PASSWORD_TOO_SHORT, USER_ALREADY_EXISTS).
      if (error instanceof ApiError) {
        const field = error.code.includes('PASSWORD')
          ? 'password'
          : /EMAIL|USER_ALREADY/.test(error.code)
            ? 'email'
            : undefined;
        if (field) {
          setError(field, { message: error.message });
          return;
        }
      }
      showServerError(error, setError, ['name', 'email', 'password']);
      return;
    }
    navigate(withNext('/check-inbox', next, { email }), { replace: true });
  });

  return (
    <AccountFrame
      title="Create your account"
      intro="One account for every studio you follow or help run."
    >
      <form noValidate onSubmit={onSubmit} className="space-y-5">
        {errors.root?.server ? <FormAlert>{errors.root.server.message}</FormAlert> : null}
        <TextField
          label="Your name"
          hint="Shown to the studios you join."
          autoComplete="name"
          error={errors.name?.message}
          {...register('name')}
        />
        <TextField
          label="E-mail"
          type="email"
          autoComplete="email"
          error={errors.email?.message}
          {...register('email')}
        />
        <TextField
          label="Password"
          hint={`At least ${PASSWORD_MIN_LENGTH} characters.`}
          type="password"
          autoComplete="new-password"
          error={errors.password?.message}
          {...register('password')}
        />
        <Button type="submit" size="hand" disabled={isSubmitting}>
          {isSubmitting ? 'Creating…' : 'Create account'}
        </Button>
      </form>
      <Link to={withNext('/sign-in', next)} className={textLinkClass}>
        Have an account? Sign in
      </Link>
    </AccountFrame>
  );
}
