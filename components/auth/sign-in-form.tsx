'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { signIn } from 'next-auth/react';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { Field } from '@/components/ui/field';
import { FormAlert } from '@/components/ui/form-alert';
import { postJson } from '@/components/ui/post-json';
import { signInLinkSchema, signInSchema } from '@/lib/validation/auth-forms';

type SignInValues = { email: string; password: string };

export function SignInForm({ next }: { next: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [linkMessage, setLinkMessage] = useState<string | null>(null);
  const form = useForm<SignInValues>({ resolver: zodResolver(signInSchema), defaultValues: { email: '', password: '' } });
  const { errors, isSubmitting } = form.formState;

  const onSubmit = form.handleSubmit(async (values) => {
    setError(null);
    const result = await signIn('password', { ...values, redirect: false });
    if (!result || result.error) {
      setError(result?.error === 'rate_limited' ? 'Too many attempts. Wait a few minutes and try again.' : 'The e-mail or password is not right.');
      return;
    }
    router.replace(next);
    router.refresh();
  });

  const sendLink = async () => {
    setError(null);
    setLinkMessage(null);
    const parsed = signInLinkSchema.safeParse({ email: form.getValues('email') });
    if (!parsed.success) {
      form.setError('email', { message: 'Enter your e-mail address first' });
      return;
    }
    const res = await postJson('/api/v1/auth/sign-in-link', parsed.data);
    setLinkMessage(res.ok ? (res.data as { message: string }).message : res.message);
  };

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <Field label="E-mail" error={errors.email?.message}>
        {(p) => <input {...p} type="email" autoComplete="username" className="field-input" {...form.register('email')} />}
      </Field>
      <Field label="Password" error={errors.password?.message}>
        {(p) => <input {...p} type="password" autoComplete="current-password" className="field-input" {...form.register('password')} />}
      </Field>
      {error ? <FormAlert>{error}</FormAlert> : null}
      <button type="submit" className="btn-primary w-full" disabled={isSubmitting}>
        {isSubmitting ? 'Signing in…' : 'Sign in'}
      </button>
      <div className="border-t border-rule pt-4">
        <button type="button" className="btn-quiet w-full" onClick={() => void sendLink()}>
          E-mail me a sign-in link instead
        </button>
        {linkMessage ? (
          <p role="status" className="mt-2 text-sm text-brine-700">
            {linkMessage}
          </p>
        ) : null}
      </div>
    </form>
  );
}
