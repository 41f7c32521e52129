'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useRouter, useSearchParams } from 'next/navigation';
import { signIn } from 'next-auth/react';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import { safeReturnPath } from '@/lib/return-path';
import { signUpSchema } from '@/lib/validations/auth';

type Values = z.input<typeof signUpSchema>;

export function SignUpForm() {
  const router = useRouter();
  const params = useSearchParams();
  const [error, setError] = useState<string | null>(null);
  // Where "Sign in to save" (or a page that needs an account) asked to come back to: only ever a path on this site.
  const requested = params.get('callbackUrl');
  const safeNext = safeReturnPath(requested, '/library');
  const carry = requested && safeNext !== '/library' ? `?callbackUrl=${encodeURIComponent(safeNext)}` : '';
  const { register, handleSubmit, formState, setError: setFieldError } = useForm<Values>({ resolver: zodResolver(signUpSchema), mode: 'onTouched' });

  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    try {
      await apiFetch('/api/v1/auth/sign-up', { method: 'POST', json: values });
    } catch (e) {
      if (e instanceof ApiError) {
        for (const issue of e.issues) if (['name', 'email', 'password'].includes(issue.path)) setFieldError(issue.path as keyof Values, { message: issue.message });
        setError(e.message);
      } else setError('Could not create the account.');
      return;
    }
    const res = await signIn('credentials', { email: values.email, password: values.password, redirect: false, callbackUrl: '/library' });
    if (res?.error) {
      setError('The account was created, but signing in failed. Try signing in.');
      return;
    }
    router.push(safeNext);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <h1 className="text-xl font-semibold">Create your account</h1>
      <p className="text-sm text-ink-soft">You get a personal workspace for your Systems; you can join a team&apos;s workspace by invitation.</p>
      {error ? <Notice kind="error">{error}</Notice> : null}
      <Field label="Name" autoComplete="name" {...register('name')} error={formState.errors.name?.message} />
      <Field label="E-mail" type="email" autoComplete="email" {...register('email')} error={formState.errors.email?.message} />
      <Field label="Password" type="password" autoComplete="new-password" hint="At least 10 characters." {...register('password')} error={formState.errors.password?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Creating…' : 'Create account'}
      </Button>
      <p className="text-sm">
        Already have one?{' '}
        <Link href={`/sign-in${carry}`} className="text-mains underline">
          Sign in
        </Link>
      </p>
    </form>
  );
}
