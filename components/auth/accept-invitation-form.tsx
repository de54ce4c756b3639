'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { postJson } from '@/components/ui/post-json';
import { acceptInvitationSchema } from '@/lib/validation/auth-forms';

type Values = { token: string; password: string; confirm: string };

export function AcceptInvitationForm({ token }: { token: string }) {
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const form = useForm<Values>({ resolver: zodResolver(acceptInvitationSchema), defaultValues: { token, password: '', confirm: '' } });
  const { errors, isSubmitting } = form.formState;
  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const res = await postJson<{ email: string }>('/api/v1/auth/invitation', values);
    if (res.ok) setDone(res.data.email);
    else setError(res.message);
  });
  if (done) {
    return (
      <div className="space-y-4">
        <p role="status">Your password is set for {done}. You can sign in now.</p>
        <Link href="/sign-in" className="btn-primary w-full">
          Sign in
        </Link>
      </div>
    );
  }
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <input type="hidden" {...form.register('token')} />
      <Field label="New password (at least 10 characters)" error={errors.password?.message}>
        {(p) => <input {...p} type="password" autoComplete="new-password" className="field-input" {...form.register('password')} />}
      </Field>
      <Field label="The same password again" error={errors.confirm?.message}>
        {(p) => <input {...p} type="password" autoComplete="new-password" className="field-input" {...form.register('confirm')} />}
      </Field>
      {errors.token ? <p className="field-error">{errors.token.message}</p> : null}
      {error ? <FormAlert>{error}</FormAlert> : null}
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
        Set password
      </button>
    </form>
  );
}
