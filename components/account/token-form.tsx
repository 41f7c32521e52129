'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { useForm, useWatch } from 'react-hook-form';
import type { z } from 'zod';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import type { WorkspaceItem } from '@/lib/hooks/use-workspaces';
import { accessTokenCreateSchema } from '@/lib/validations/access-token';
import type { CreatedAccessToken } from './use-access-tokens';

type FormInput = z.input<typeof accessTokenCreateSchema>;
type FormOutput = z.output<typeof accessTokenCreateSchema>;

const FIELDS = ['name', 'workspaceId', 'scope', 'expiresInDays'] as const;
type FieldName = (typeof FIELDS)[number];

/** The choices of life; the empty value is "never" (null in the request). */
const EXPIRY_CHOICES = [
  { value: '7', label: 'in 7 days' },
  { value: '30', label: 'in 30 days' },
  { value: '90', label: 'in 90 days' },
  { value: '365', label: 'in 365 days' },
  { value: '', label: 'never' },
] as const;

const selectClass = (error?: string) => `w-full rounded-md border bg-white px-3 py-2 text-sm text-ink ${error ? 'border-fail' : 'border-line'}`;

function FieldError({ id, message }: { id: string; message?: string }) {
  return message ? (
    <p id={id} role="alert" className="text-sm text-fail">
      {message}
    </p>
  ) : null;
}

/** Makes a token: the same zod schema checks it here (as it is typed) and in POST /api/v1/tokens. */
export function TokenForm({ workspaces, onCreated }: { workspaces: WorkspaceItem[]; onCreated: (created: CreatedAccessToken) => void }) {
  const preferred = workspaces.find((w) => !w.personal) ?? workspaces[0];
  const defaults: FormInput = { name: '', workspaceId: preferred?.id ?? '', scope: 'read', expiresInDays: 90 };
  const {
    register,
    handleSubmit,
    control,
    setError,
    setValue,
    reset,
    formState: { errors, isSubmitting },
  } = useForm<FormInput, unknown, FormOutput>({ resolver: zodResolver(accessTokenCreateSchema), mode: 'onChange', defaultValues: defaults });
  const workspaceId = useWatch({ control, name: 'workspaceId' });
  const chosen = workspaces.find((w) => w.id === workspaceId);
  const viewerOnly = chosen?.role === 'viewer';

  const onSubmit = handleSubmit(async (values) => {
    try {
      const created = await apiFetch<CreatedAccessToken>('/api/v1/tokens', { method: 'POST', json: values });
      reset({ ...defaults, workspaceId: values.workspaceId });
      onCreated(created);
    } catch (e) {
      const issues = e instanceof ApiError ? e.issues.filter((i) => (FIELDS as readonly string[]).includes(i.path)) : [];
      for (const issue of issues) setError(issue.path as FieldName, { message: issue.message });
      if (!issues.length) setError('root', { message: e instanceof ApiError ? e.message : 'That did not work; no token was made.' });
    }
  });

  if (!workspaces.length) return <Notice kind="info">You are in no workspace yet, so there is nothing a token could reach. Create a workspace on the Team page first.</Notice>;

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="token-form-title" className="flex flex-col gap-4 rounded-lg border border-line bg-white p-4">
      <h3 id="token-form-title" className="text-base font-semibold">
        Make a token
      </h3>
      {errors.root?.message ? <Notice kind="error">{errors.root.message}</Notice> : null}
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 md:grid-cols-2">
        <Field id="token-name" label="Name" maxLength={80} autoComplete="off" hint="What it is for, e.g. commissioning checklist" {...register('name')} error={errors.name?.message} />
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="token-workspace" className="text-sm font-medium text-ink">
            Workspace
          </label>
          <select
            id="token-workspace"
            className={selectClass(errors.workspaceId?.message)}
            aria-invalid={errors.workspaceId ? true : undefined}
            aria-describedby={errors.workspaceId ? 'token-workspace-error' : viewerOnly ? 'token-workspace-viewer' : undefined}
            {...register('workspaceId', {
              // A viewer's token can only read: switch a chosen "read and write" back to "read".
              onChange: (e: { target: { value: string } }) => {
                if (workspaces.find((w) => w.id === e.target.value)?.role === 'viewer') setValue('scope', 'read', { shouldValidate: true });
              },
            })}
          >
            {workspaces.map((w) => (
              <option key={w.id} value={w.id}>
                {w.name} (you: {w.role})
              </option>
            ))}
          </select>
          <FieldError id="token-workspace-error" message={errors.workspaceId?.message} />
          {viewerOnly && !errors.workspaceId ? (
            <p id="token-workspace-viewer" className="text-xs text-ink-faint">
              You are a viewer here, so a token for this workspace can only read.
            </p>
          ) : null}
        </div>
        <fieldset className="flex min-w-0 flex-col gap-1.5" aria-describedby={errors.scope ? 'token-scope-error' : undefined}>
          <legend className="mb-1 text-sm font-medium text-ink">Access</legend>
          <label className="flex items-start gap-2 text-sm">
            <input type="radio" value="read" className="mt-1" {...register('scope')} />
            <span>
              read <span className="text-ink-faint">— acts as a viewer; never changes anything</span>
            </span>
          </label>
          <label className={`flex items-start gap-2 text-sm ${viewerOnly ? 'text-ink-faint' : ''}`}>
            <input type="radio" value="write" className="mt-1" disabled={viewerOnly} {...register('scope')} />
            <span>
              read and write <span className="text-ink-faint">— acts with your role, at most an editor: creates and changes Systems</span>
            </span>
          </label>
          <FieldError id="token-scope-error" message={errors.scope?.message} />
        </fieldset>
        <div className="flex min-w-0 flex-col gap-1">
          <label htmlFor="token-expiry" className="text-sm font-medium text-ink">
            Expires
          </label>
          <select
            id="token-expiry"
            className={selectClass(errors.expiresInDays?.message)}
            aria-invalid={errors.expiresInDays ? true : undefined}
            aria-describedby={errors.expiresInDays ? 'token-expiry-error' : undefined}
            {...register('expiresInDays', { setValueAs: (v: unknown) => (v === '' || v === null ? null : Number(v)) })}
          >
            {EXPIRY_CHOICES.map((c) => (
              <option key={c.value} value={c.value}>
                {c.label}
              </option>
            ))}
          </select>
          <FieldError id="token-expiry-error" message={errors.expiresInDays?.message} />
        </div>
      </div>
      <div>
        <Button type="submit" disabled={isSubmitting}>
          {isSubmitting ? 'Making the token…' : 'Make token'}
        </Button>
      </div>
    </form>
  );
}
