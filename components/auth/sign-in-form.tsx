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
import { safeReturnPath } from '@/lib/return-path';
import { signInSchema } from '@/lib/validations/auth';

type Values = z.input<typeof signInSchema>;

export function SignInForm() {
  const router = useRouter();
  const params = useSearchParams();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(signInSchema) });
  // Only ever a path on this site; it may hold a whole anonymous System (`/systems/new?s=…`), which must come back intact.
  const requested = params.get('callbackUrl') ?? params.get('next');
  const safeNext = safeReturnPath(requested, '/library');
  const carry = requested && safeNext !== '/library' ? `?callbackUrl=${encodeURIComponent(safeNext)}` : '';

  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    // next-auth keeps its callbackUrl in a cookie: give it a short one; this form does the navigation itself.
    const res = await signIn('credentials', { email: values.email, password: values.password, redirect: false, callbackUrl: '/library' });
    if (!res || res.error) {
      setError(res?.error && res.error !== 'CredentialsSignin' ? res.error : 'That e-mail and password do not match an account.');
      return;
    }
    router.push(safeNext);
    router.refresh();
  });

  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <h1 className="text-xl font-semibold">Sign in</h1>
      {params.get('reset') === '1' ? <Notice kind="ok">Your password was changed. Sign in with the new one.</Notice> : null}
      {error ? <Notice kind="error">{error}</Notice> : null}
      <Field label="E-mail" type="email" autoComplete="email" {...register('email')} error={formState.errors.email?.message} />
      <Field label="Password" type="password" autoComplete="current-password" {...register('password')} error={formState.errors.password?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        {formState.isSubmitting ? 'Signing in…' : 'Sign in'}
      </Button>
      <div className="flex justify-between text-sm">
        <Link href="/forgot" className="text-mains underline">
          Forgot password?
        </Link>
        <Link href={`/sign-up${carry}`} className="text-mains underline">
          Create an account
        </Link>
      </div>
    </form>
  );
}
