import { zodResolver } from '@hookform/resolvers/zod';
import { API_TOKEN_DEFAULT_DAYS, type CreateApiTokenInput, type CreatedApiToken, createApiTokenSchema } from '@polecourt/contracts';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';

import { Alert } from '@/components/ui/alert';
import { Button } from '@/components/ui/button';
import { Loading } from '@/components/ui/loading';
import { TextField } from '@/components/ui/text-field';
import { formatDateTime } from '@/utils/format-date-time';

import { useCreateApiToken } from '../api/create-api-token';
import { useApiTokens } from '../api/get-api-tokens';
import { useRevokeApiToken } from '../api/revoke-api-token';

function NewSecret({ created, onDone }: { created: CreatedApiToken; onDone: () => void }) {
  const [copied, setCopied] = useState(false);
  return (
    <Alert tone="success" title={`Token “${created.token.name}” created`}>
      <p>Copy it now: Polecourt keeps only a fingerprint of it and cannot show it again.</p>
      <div className="mt-2 flex flex-wrap items-center gap-2">
        <code data-testid="new-token-secret" className="rounded bg-white px-2 py-1 font-mono text-sm break-all">
          {created.secret}
        </code>
        <Button
          size="sm"
          onClick={() => {
            void navigator.clipboard?.writeText(created.secret).then(() => setCopied(true));
          }}
        >
          {copied ? 'Copied' : 'Copy'}
        </Button>
        <Button size="sm" variant="quiet" onClick={onDone}>
          I have stored it
        </Button>
      </div>
      <p className="mt-2 text-sm">
        Send it as <code>Authorization: Bearer …</code>. It acts with your role and stops working when revoked, when it expires, or when your account is deactivated.
      </p>
    </Alert>
  );
}

export function ApiTokensPanel() {
  const tokens = useApiTokens();
  const revoke = useRevokeApiToken();
  const [created, setCreated] = useState<CreatedApiToken | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<z.input<typeof createApiTokenSchema>, unknown, CreateApiTokenInput>({
    resolver: zodResolver(createApiTokenSchema),
    defaultValues: { name: '', expiresInDays: API_TOKEN_DEFAULT_DAYS },
  });
  const create = useCreateApiToken({
    mutationConfig: {
      onSuccess: (result) => {
        setCreated(result);
        reset();
      },
      onError: (error) => {
        for (const field of ['name', 'expiresInDays'] as const) if (error.fields[field]) setError(field, { message: error.fields[field] });
      },
    },
  });

  return (
    <section className="flex flex-col gap-4" aria-labelledby="api-tokens-heading">
      <h2 id="api-tokens-heading" className="text-lg font-semibold">
        API tokens
      </h2>
      <p className="text-sm text-slate-600">For pipelines and scripts. A token acts as you, with your role: an auditor’s token can read but not change anything.</p>
      {created && <NewSecret created={created} onDone={() => setCreated(null)} />}
      <form noValidate className="flex flex-wrap items-end gap-3" onSubmit={handleSubmit((values) => create.mutate(values))}>
        <TextField label="Name" placeholder="e.g. nightly assessment job" error={errors.name?.message} {...register('name')} />
        <TextField label="Valid for (days)" type="number" min={1} max={365} error={errors.expiresInDays?.message} {...register('expiresInDays', { valueAsNumber: true })} />
        <Button type="submit" variant="primary" busy={create.isPending}>
          Create token
        </Button>
      </form>
      {create.error && Object.keys(create.error.fields).length === 0 && (
        <Alert tone="error" title="No token was created">
          <p>{create.error.message}</p>
        </Alert>
      )}
      {tokens.isPending ? (
        <Loading label="Loading your tokens…" />
      ) : tokens.error ? (
        <Alert tone="error" title="Your tokens could not be loaded">
          <p>{tokens.error.message}</p>
        </Alert>
      ) : tokens.data.items.length === 0 ? (
        <p className="text-sm text-slate-600">You have no API tokens yet.</p>
      ) : (
        <table className="w-full text-left text-sm">
          <thead>
            <tr className="border-b border-slate-200">
              <th className="py-2">Name</th>
              <th>Starts with</th>
              <th>Created</th>
              <th>Last used</th>
              <th>Expires</th>
              <th>State</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {tokens.data.items.map((t) => {
              const expired = Date.parse(t.expiresAt) <= Date.now();
              return (
                <tr key={t.id} className="border-b border-slate-100">
                  <td className="py-2">{t.name}</td>
                  <td className="font-mono">{t.prefix}…</td>
                  <td>{formatDateTime(t.createdAt)}</td>
                  <td>{t.lastUsedAt ? formatDateTime(t.lastUsedAt) : 'never'}</td>
                  <td>{formatDateTime(t.expiresAt)}</td>
                  <td>{t.revokedAt ? 'revoked' : expired ? 'expired' : 'active'}</td>
                  <td className="text-right">
                    {!t.revokedAt && (
                      <Button size="sm" variant="danger" busy={revoke.isPending && revoke.variables === t.id} onClick={() => revoke.mutate(t.id)}>
                        Revoke
                      </Button>
                    )}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {revoke.error && (
        <Alert tone="error" title="The token was not revoked">
          <p>{revoke.error.message}</p>
        </Alert>
      )}
    </section>
  );
}
