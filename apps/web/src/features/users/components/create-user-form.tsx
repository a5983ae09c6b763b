import { zodResolver } from '@hookform/resolvers/zod';
import { type CreateUserInput, MIN_PASSWORD_LENGTH, type PublicUser, ROLES, ROLE_LABELS, createUserSchema } from '@polecourt/contracts';
import { type FieldPath, useForm } from 'react-hook-form';
import type { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/select-field';
import { TextField } from '@/components/ui/text-field';

import { useCreateUser } from '../api/create-user';

const FIELD_NAMES = ['name', 'email', 'role', 'password'] as const satisfies readonly FieldPath<CreateUserInput>[];

const roleOptions = ROLES.map((role) => ({ value: role, label: ROLE_LABELS[role] }));

export function CreateUserForm({
  schema = createUserSchema,
  onCreated,
  onCancel,
}: {
  schema?: typeof createUserSchema;
  onCreated: (user: PublicUser) => void;
  onCancel: () => void;
}) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof createUserSchema>, unknown, CreateUserInput>({
    resolver: zodResolver(schema),
    defaultValues: { name: '', email: '', role: 'controls_engineer', password: '' },
  });

  const create = useCreateUser({
    mutationConfig: {
      onSuccess: (user) => onCreated(user),
      onError: (error) => {
        // Put each server-side complaint under the input it is about.
        if (error.code === 'email_taken') {
          setError('email', { message: error.fields.email ?? error.message });
        }
        for (const [field, message] of Object.entries(error.fields)) {
          if ((FIELD_NAMES as readonly string[]).includes(field)) setError(field as (typeof FIELD_NAMES)[number], { message });
        }
      },
    },
  });

  const fieldErrorShown = create.error && (create.error.code === 'email_taken' || Object.keys(create.error.fields).length > 0);

  return (
    <form noValidate onSubmit={handleSubmit((values) => create.mutate(values))} className="flex flex-col gap-4">
      {create.error && !fieldErrorShown && (
        <Alert tone="error" title="The account was not created">
          <p>{create.error.message}</p>
        </Alert>
      )}
      <TextField label="Name" autoComplete="off" autoFocus error={errors.name?.message} {...register('name')} />
      <TextField label="E-mail" type="email" autoComplete="off" spellCheck={false} error={errors.email?.message} {...register('email')} />
      <SelectField
        label="Role"
        options={roleOptions}
        hint="What the person may use. Auditors can read everything and change nothing."
        error={errors.role?.message}
        {...register('role')}
      />
      <TextField
        label="Initial password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${MIN_PASSWORD_LENGTH} characters. Hand it over in person or by phone, not in the same e-mail as the address.`}
        error={errors.password?.message}
        {...register('password')}
      />
      <div className="flex justify-end gap-2 pt-2">
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="primary" busy={create.isPending}>
          {create.isPending ? 'Creating…' : 'Create account'}
        </Button>
      </div>
    </form>
  );
}
