'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import { createColumnHelper, getCoreRowModel, useReactTable } from '@tanstack/react-table';
import { useMemo, useState } from 'react';
import { useForm } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { DataTable } from '@/components/ui/data-table';
import { postJson } from '@/components/ui/post-json';
import { inviteUserSchema } from '@/lib/validation/admin-forms';

export interface SiteUser {
  id: string;
  email: string;
  displayName: string;
  role: 'technician' | 'supervisor' | 'admin';
  status: 'invited' | 'active' | 'deactivated';
  lastSignInAt: string | null;
}

type InviteValues = { email: string; displayName: string; role: SiteUser['role'] };
const col = createColumnHelper<SiteUser>();

async function fetchUsers(): Promise<SiteUser[]> {
  const res = await fetch('/api/v1/admin/users');
  if (!res.ok) throw new Error('Could not load the users.');
  return ((await res.json()) as { users: SiteUser[] }).users;
}

export function UsersPanel({ selfId }: { selfId: string }) {
  const qc = useQueryClient();
  const users = useQuery({ queryKey: ['admin', 'users'], queryFn: fetchUsers });
  const [message, setMessage] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const update = useMutation({
    mutationFn: async (v: { id: string; role?: SiteUser['role']; status?: 'active' | 'deactivated' }) => {
      const res = await postJson(`/api/v1/admin/users/${v.id}`, { role: v.role, status: v.status }, 'PATCH');
      if (!res.ok) throw new Error(res.message);
    },
    onSuccess: () => {
      setMessage({ kind: 'ok', text: 'Saved.' });
      void qc.invalidateQueries({ queryKey: ['admin', 'users'] });
    },
    onError: (e) => setMessage({ kind: 'error', text: e.message }),
  });

  const columns = useMemo(
    () => [
      col.accessor('displayName', { header: 'Name' }),
      col.accessor('email', { header: 'E-mail' }),
      col.accessor('role', {
        header: 'Role',
        cell: (c) =>
          c.row.original.id === selfId ? (
            c.getValue()
          ) : (
            <select
              aria-label={`Role of ${c.row.original.displayName}`}
              className="field-input mt-0 w-auto"
              value={c.getValue()}
              onChange={(e) => update.mutate({ id: c.row.original.id, role: e.target.value as SiteUser['role'] })}
            >
              <option value="technician">technician</option>
              <option value="supervisor">supervisor</option>
              <option value="admin">admin</option>
            </select>
          ),
      }),
      col.accessor('status', { header: 'Status' }),
      col.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => {
          const u = c.row.original;
          if (u.id === selfId || u.status === 'invited') return null;
          return u.status === 'active' ? (
            <button type="button" className="btn-danger" onClick={() => update.mutate({ id: u.id, status: 'deactivated' })}>
              Deactivate
            </button>
          ) : (
            <button type="button" className="btn-quiet" onClick={() => update.mutate({ id: u.id, status: 'active' })}>
              Reactivate
            </button>
          );
        },
      }),
    ],
    [selfId, update],
  );
  const table = useReactTable({ data: users.data ?? [], columns, getCoreRowModel: getCoreRowModel() });

  return (
    <section aria-labelledby="users-title" className="panel space-y-4">
      <h2 id="users-title">People</h2>
      {users.isError ? <p role="alert" className="field-error">{(users.error as Error).message}</p> : null}
      <DataTable table={table} caption="People of this site" />
      {message ? (
        <p role={message.kind === 'error' ? 'alert' : 'status'} className={message.kind === 'error' ? 'field-error' : 'text-sm text-verdigris-700'}>
          {message.text}
        </p>
      ) : null}
      <InviteForm onInvited={() => void qc.invalidateQueries({ queryKey: ['admin', 'users'] })} />
    </section>
  );
}

function InviteForm({ onInvited }: { onInvited: () => void }) {
  const [result, setResult] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);
  const form = useForm<InviteValues>({ resolver: zodResolver(inviteUserSchema), defaultValues: { email: '', displayName: '', role: 'technician' } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    const res = await postJson('/api/v1/admin/users', values);
    if (res.ok) {
      setResult({ kind: 'ok', text: `Invitation sent to ${values.email}.` });
      form.reset();
      onInvited();
    } else {
      for (const f of res.fields ?? []) form.setError(f.field as keyof InviteValues, { message: f.message });
      setResult({ kind: 'error', text: res.message });
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="grid gap-3 border-t border-rule pt-4 sm:grid-cols-[1fr_1fr_auto_auto] sm:items-start">
      <Field label="E-mail" error={errors.email?.message}>
        {(p) => <input {...p} type="email" className="field-input" {...form.register('email')} />}
      </Field>
      <Field label="Name or role account" error={errors.displayName?.message}>
        {(p) => <input {...p} className="field-input" {...form.register('displayName')} />}
      </Field>
      <Field label="Role">
        {(p) => (
          <select {...p} className="field-input" {...form.register('role')}>
            <option value="technician">technician</option>
            <option value="supervisor">supervisor</option>
            <option value="admin">admin</option>
          </select>
        )}
      </Field>
      {/* Fields line up at the top whatever messages sit under them; the button sits level with the inputs (below a label's height). */}
      <button type="submit" className="btn-primary sm:mt-6" disabled={isSubmitting}>
        Invite
      </button>
      {result ? (
        <p role={result.kind === 'error' ? 'alert' : 'status'} className={`sm:col-span-4 ${result.kind === 'error' ? 'field-error' : 'text-sm text-verdigris-700'}`}>
          {result.text}
        </p>
      ) : null}
    </form>
  );
}
