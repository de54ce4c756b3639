'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { postJson } from '@/components/ui/post-json';
import { createTokenSchema } from '@/lib/validation/admin-forms';

interface ApiToken {
  id: string;
  name: string;
  role: string;
  prefix: string;
  createdAt: string;
  lastUsedAt: string | null;
  revokedAt: string | null;
}
type TokenValues = { name: string; role: 'technician' | 'supervisor' };

export function TokensPanel() {
  const qc = useQueryClient();
  const [secret, setSecret] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const tokens = useQuery({
    queryKey: ['admin', 'tokens'],
    queryFn: async () => {
      const res = await fetch('/api/v1/admin/tokens');
      if (!res.ok) throw new Error('Could not load the API tokens.');
      return ((await res.json()) as { tokens: ApiToken[] }).tokens;
    },
  });
  const revoke = useMutation({
    mutationFn: async (id: string) => {
      const res = await postJson(`/api/v1/admin/tokens/${id}`, {}, 'DELETE');
      if (!res.ok) throw new Error(res.message);
    },
    onSuccess: () => void qc.invalidateQueries({ queryKey: ['admin', 'tokens'] }),
    onError: (e) => setError(e.message),
  });
  const form = useForm<TokenValues>({ resolver: zodResolver(createTokenSchema), defaultValues: { name: '', role: 'technician' } });
  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const res = await postJson<{ secret: string }>('/api/v1/admin/tokens', values);
    if (!res.ok) return setError(res.message);
    setSecret(res.data.secret);
    form.reset();
    void qc.invalidateQueries({ queryKey: ['admin', 'tokens'] });
  });

  return (
    <section aria-labelledby="tokens-title" className="panel space-y-4">
      <h2 id="tokens-title">API tokens</h2>
      <p className="text-sm text-ink-soft">For plant systems that call Rungbook&apos;s API. A token acts for this site with the role you choose.</p>
      {secret ? (
        <div role="status" className="rounded-md border border-brine-500 bg-brine-50 p-3 text-sm">
          <p className="font-semibold">Copy this token now: it is shown only once.</p>
          <code data-testid="new-token" className="mt-1 block break-all font-mono">
            {secret}
          </code>
        </div>
      ) : null}
      <ul className="divide-y divide-rule text-sm">
        {(tokens.data ?? []).map((t) => (
          <li key={t.id} className="flex flex-wrap items-center justify-between gap-2 py-2">
            <span>
              <strong>{t.name}</strong> · {t.role} · <code>{t.prefix}…</code>{' '}
              {t.revokedAt ? <span className="text-ember-700">revoked</span> : <span className="text-verdigris-700">active</span>}
            </span>
            {!t.revokedAt ? (
              <button type="button" className="btn-danger" onClick={() => revoke.mutate(t.id)}>
                Revoke {t.name}
              </button>
            ) : null}
          </li>
        ))}
      </ul>
      <form onSubmit={onSubmit} noValidate className="grid gap-3 border-t border-rule pt-4 sm:grid-cols-[1fr_auto_auto] sm:items-start">
        <Field label="Token name" error={form.formState.errors.name?.message}>
          {(p) => <input {...p} className="field-input" {...form.register('name')} />}
        </Field>
        <Field label="Acts as">
          {(p) => (
            <select {...p} className="field-input" {...form.register('role')}>
              <option value="technician">technician</option>
              <option value="supervisor">supervisor</option>
            </select>
          )}
        </Field>
        <button type="submit" className="btn-primary sm:mt-6">
          Create token
        </button>
      </form>
      {error ? <p role="alert" className="field-error">{error}</p> : null}
    </section>
  );
}
