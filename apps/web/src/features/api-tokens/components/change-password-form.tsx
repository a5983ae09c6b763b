import { zodResolver } from '@hookform/resolvers/zod';
import { type ChangePasswordInput, MIN_PASSWORD_LENGTH, changePasswordSchema } from '@polecourt/contracts';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

import { useChangePassword } from '../api/change-password';

export function ChangePasswordForm() {
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof changePasswordSchema>, unknown, ChangePasswordInput>({
    resolver: zodResolver(changePasswordSchema),
    defaultValues: { currentPassword: '', newPassword: '' },
  });
  const change = useChangePassword({
    mutationConfig: {
      onSuccess: () => reset(),
      onError: (error) => {
        for (const field of ['currentPassword', 'newPassword'] as const) if (error.fields[field]) setError(field, { message: error.fields[field] });
      },
    },
  });
  return (
    <section className="flex flex-col gap-4" aria-labelledby="password-heading">
      <h2 id="password-heading" className="text-lg font-semibold">
        Password
      </h2>
      <form noValidate className="flex max-w-md flex-col gap-3" onSubmit={handleSubmit((values) => change.mutate(values))}>
        <TextField label="Current password" type="password" autoComplete="current-password" error={errors.currentPassword?.message} {...register('currentPassword')} />
        <TextField
          label="New password"
          type="password"
          autoComplete="new-password"
          hint={`At least ${MIN_PASSWORD_LENGTH} characters; not one of the first anyone would guess.`}
          error={errors.newPassword?.message}
          {...register('newPassword')}
        />
        <div>
          <Button type="submit" variant="primary" busy={change.isPending}>
            Change password
          </Button>
        </div>
      </form>
      {change.isSuccess && <Alert tone="success" title="Your password was changed" />}
      {change.error && Object.keys(change.error.fields).length === 0 && (
        <Alert tone="error" title="The password was not changed">
          <p>{change.error.message}</p>
        </Alert>
      )}
    </section>
  );
}
