import { zodResolver } from '@hookform/resolvers/zod';
import { MIN_PASSWORD_LENGTH, type SetPasswordReply, passwordSchema } from '@polecourt/contracts';
import { useForm } from 'react-hook-form';
import { Link } from 'react-router-dom';
import { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

import { useSetPassword } from '../api/set-password';

export const setPasswordFormSchema = z
  .object({ password: passwordSchema, confirm: z.string() })
  .refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'The two entries are not the same' });
type SetPasswordFormValues = z.infer<typeof setPasswordFormSchema>;

/** Choose a password with the one-time token from the e-mail link. */
export function SetPasswordForm({
  token,
  schema = setPasswordFormSchema,
  onDone,
}: {
  token: string;
  schema?: typeof setPasswordFormSchema;
  onDone: (reply: SetPasswordReply) => void;
}) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<SetPasswordFormValues>({ resolver: zodResolver(schema), defaultValues: { password: '', confirm: '' } });

  const save = useSetPassword({
    mutationConfig: {
      onSuccess: (reply) => onDone(reply),
      onError: (error) => {
        if (error.fields.password) setError('password', { message: error.fields.password });
      },
    },
  });

  const linkRefused = save.error?.code === 'token_invalid';

  return (
    <form
      noValidate
      aria-label="Choose your password"
      className="flex flex-col gap-4"
      onSubmit={handleSubmit((values) => save.mutate({ token, password: values.password }))}
    >
      {linkRefused && (
        <Alert tone="error" title="This link cannot be used">
          <p>{save.error?.message}</p>
          <p className="mt-1">
            <Link to="/forgot-password">Ask for a new link</Link>
          </p>
        </Alert>
      )}
      {save.error && !linkRefused && !save.error.fields.password && (
        <Alert tone="error" title="The password was not set">
          <p>{save.error.message}</p>
        </Alert>
      )}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        autoFocus
        hint={`At least ${MIN_PASSWORD_LENGTH} characters. A few unrelated words make a good one; very common passwords are refused.`}
        error={errors.password?.message}
        {...register('password')}
      />
      <TextField label="The same password again" type="password" autoComplete="new-password" error={errors.confirm?.message} {...register('confirm')} />
      <Button type="submit" variant="primary" busy={save.isPending}>
        {save.isPending ? 'Saving…' : 'Set password'}
      </Button>
    </form>
  );
}
