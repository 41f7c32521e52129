'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import { resetRequestSchema } from '@/lib/validations/auth';

type Values = z.input<typeof resetRequestSchema>;

export function ForgotForm() {
  const [sent, setSent] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(resetRequestSchema) });
  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    try {
      await apiFetch('/api/v1/auth/password-reset', { method: 'POST', json: values });
      setSent(true);
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'Could not send the link.');
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <h1 className="text-xl font-semibold">Reset your password</h1>
      {sent ? (
        <Notice kind="ok">If an account uses that address, a reset link is on its way. It works once, for one hour.</Notice>
      ) : (
        <>
          {error ? <Notice kind="error">{error}</Notice> : null}
          <Field label="E-mail" type="email" autoComplete="email" {...register('email')} error={formState.errors.email?.message} />
          <Button type="submit" disabled={formState.isSubmitting}>
            Send reset link
          </Button>
        </>
      )}
      <Link href="/sign-in" className="text-sm text-mains underline">
        Back to sign in
      </Link>
    </form>
  );
}
