'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import Link from 'next/link';
import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import { passwordSchema } from '@/lib/validations/auth';

const formSchema = z.object({ password: passwordSchema, confirm: z.string() }).refine((v) => v.password === v.confirm, { path: ['confirm'], message: 'the two passwords differ' });
type Values = z.input<typeof formSchema>;

export function ResetForm({ token }: { token: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<Values>({ resolver: zodResolver(formSchema) });
  const onSubmit = handleSubmit(async (values) => {
    setError(null);
    try {
      await apiFetch('/api/v1/auth/password-reset/confirm', { method: 'POST', json: { token, password: values.password } });
      router.push('/sign-in?reset=1');
    } catch (e) {
      setError(e instanceof ApiError ? e.message : 'Could not change the password.');
    }
  });
  return (
    <form onSubmit={onSubmit} noValidate className="flex flex-col gap-4">
      <h1 className="text-xl font-semibold">Choose a new password</h1>
      {error ? (
        <Notice kind="error">
          {error}{' '}
          <Link href="/forgot" className="underline">
            Ask for a new link
          </Link>
        </Notice>
      ) : null}
      <Field label="New password" type="password" autoComplete="new-password" hint="At least 10 characters." {...register('password')} error={formState.errors.password?.message} />
      <Field label="Repeat it" type="password" autoComplete="new-password" {...register('confirm')} error={formState.errors.confirm?.message} />
      <Button type="submit" disabled={formState.isSubmitting}>
        Change password
      </Button>
    </form>
  );
}
