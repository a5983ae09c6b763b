import { zodResolver } from '@hookform/resolvers/zod';
import { type LoginInput, type SessionInfo, loginSchema } from '@polecourt/contracts';
import { useForm } from 'react-hook-form';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';
import { type ApiError, isApiError } from '@/lib/api-client';

import { useLogin } from '../api/login';

/** Words for the sign-in failures a person can act on; anything else shows the server's message. */
export function signInErrorText(error: ApiError): string {
  if (error.code === 'invalid_credentials' || error.status === 401) {
    return 'E-mail or password is not right. Check both and try again.';
  }
  if (error.status === 429) {
    return 'Too many sign-in attempts. Wait a few minutes before trying again.';
  }
  if (error.code === 'network_error') return error.message;
  return error.message;
}

export function SignInForm({ onSuccess }: { onSuccess: (session: SessionInfo) => void }) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<LoginInput>({ resolver: zodResolver(loginSchema), defaultValues: { email: '', password: '' } });

  const login = useLogin({
    mutationConfig: {
      onSuccess: (session) => onSuccess(session),
      onError: (error) => {
        if (!isApiError(error)) return;
        for (const [field, message] of Object.entries(error.fields)) {
          if (field === 'email' || field === 'password') setError(field, { message });
        }
      },
    },
  });

  return (
    <form noValidate onSubmit={handleSubmit((values) => login.mutate(values))} className="flex flex-col gap-4" aria-label="Sign in">
      {login.error && (
        <Alert tone="error" title="Not signed in">
          <p>{signInErrorText(login.error)}</p>
        </Alert>
      )}
      <TextField
        label="E-mail"
        type="email"
        autoComplete="username"
        inputMode="email"
        spellCheck={false}
        autoFocus
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
      <Button type="submit" variant="primary" busy={login.isPending}>
        {login.isPending ? 'Signing in…' : 'Sign in'}
      </Button>
    </form>
  );
}
