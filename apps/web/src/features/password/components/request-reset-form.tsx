import { zodResolver } from '@hookform/resolvers/zod';
import { type RequestResetInput, type RequestResetReply, requestResetSchema } from '@polecourt/contracts';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/text-field';

import { useRequestReset } from '../api/request-reset';

/** Ask for a link to choose a new password. The answer is the same whether or not the account exists. */
export function RequestResetForm({
  schema = requestResetSchema,
  defaultEmail = '',
  onSent,
}: {
  schema?: typeof requestResetSchema;
  defaultEmail?: string;
  onSent: (reply: RequestResetReply, email: string) => void;
}) {
  const {
    register,
    handleSubmit,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof requestResetSchema>, unknown, RequestResetInput>({
    resolver: zodResolver(schema),
    defaultValues: { email: defaultEmail },
  });

  const send = useRequestReset({
    mutationConfig: {
      onSuccess: (reply, input) => onSent(reply, input.email),
      onError: (error) => {
        if (error.fields.email) setError('email', { message: error.fields.email });
      },
    },
  });

  return (
    <form noValidate aria-label="Ask for a new password" className="flex flex-col gap-4" onSubmit={handleSubmit((values) => send.mutate(values))}>
      {send.error && !send.error.fields.email && (
        <Alert tone="error" title="Nothing was sent">
          <p>{send.error.message}</p>
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
      <Button type="submit" variant="primary" busy={send.isPending}>
        {send.isPending ? 'Sending…' : 'Send me a link'}
      </Button>
    </form>
  );
}
