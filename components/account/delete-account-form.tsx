'use client';

import { zodResolver } from '@hookform/resolvers/zod';
import { signOut } from 'next-auth/react';
import { useForm, useWatch, type DefaultValues } from 'react-hook-form';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { ApiError, apiFetch } from '@/lib/client/api';
import { accountDeleteSchema, DELETE_ACCOUNT_CONFIRMATION, type AccountDeleteFormInput, type AccountDeleteInput } from '@/lib/validations/account';
import { SoleOwnerWorkspace, type Decision } from './delete-account-workspace';
import type { DeletionPlan } from './use-deletion-plan';

/** Where the browser lands once the account is gone (the home page says so). */
const AFTER_DELETION_URL = '/?account=deleted';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * The deletion form: a decision for each workspace the account alone owns, the workspaces it simply leaves, what goes
 * with the account, the password again and the typed confirmation. The same zod schema checks it here and in
 * DELETE /api/v1/account; the server's refusals are shown next to their field.
 */
export function DeleteAccountForm({ plan, onStale }: { plan: DeletionPlan; onStale: () => void }) {
  const owned = plan.workspaces.filter((w) => w.onlyOwner);
  const left = plan.workspaces.filter((w) => !w.onlyOwner);
  const defaults: DefaultValues<AccountDeleteFormInput> = {
    password: '',
    confirm: '',
    // Alone in a workspace, deleting it is the only way; otherwise nothing is chosen for the person.
    workspaces: owned.map((w) => (w.otherMembers.length ? { workspaceId: w.workspaceId } : { workspaceId: w.workspaceId, action: 'delete' })),
  };
  const {
    register,
    handleSubmit,
    control,
    setError,
    setValue,
    formState: { errors, isSubmitting, isSubmitted },
  } = useForm<AccountDeleteFormInput, unknown, AccountDeleteInput>({ resolver: zodResolver(accountDeleteSchema), defaultValues: defaults });
  const decisions = useWatch({ control, name: 'workspaces' }) as Decision[] | undefined;
  // The server names the problem on the decision itself; the form's own check only says one is missing.
  const decisionError = (i: number) => {
    const e = errors.workspaces?.[i];
    return e ? (typeof e.message === 'string' && e.message ? e.message : 'Choose what happens to this workspace.') : undefined;
  };
  const decide = (i: number, d: Decision) => setValue(`workspaces.${i}`, d as AccountDeleteFormInput['workspaces'][number], { shouldValidate: isSubmitted });

  const onSubmit = handleSubmit(async (values) => {
    try {
      await apiFetch('/api/v1/account', { method: 'DELETE', json: values });
    } catch (e) {
      if (!(e instanceof ApiError)) return setError('root', { message: 'That did not work; nothing was deleted.' });
      let shown = false;
      for (const issue of e.issues) {
        const at = /^workspaces\.(\d+)/.exec(issue.path);
        if (issue.path === 'password' || issue.path === 'confirm') setError(issue.path, { message: issue.message });
        else if (at) setError(`workspaces.${Number(at[1])}`, { message: issue.message });
        else continue;
        shown = true;
      }
      if (!shown) setError('root', { message: e.message });
      // A workspace changed hands meanwhile: read the plan again.
      if (e.issues.some((i) => i.path.startsWith('workspaces'))) onStale();
      return;
    }
    await signOut({ callbackUrl: AFTER_DELETION_URL });
  });

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="delete-form-title" className="flex flex-col gap-5 rounded-lg border-2 border-fail bg-white p-4">
      <h3 id="delete-form-title" className="text-base font-semibold">
        Delete the account of {plan.email}
      </h3>
      {errors.root?.message ? <Notice kind="error">{errors.root.message}</Notice> : null}

      {owned.length ? (
        <section aria-labelledby="delete-owned-title" className="flex flex-col gap-2">
          <h4 id="delete-owned-title" className="text-sm font-semibold">
            Workspaces only you own: choose for each
          </h4>
          <ul className="flex flex-col gap-2">
            {owned.map((w, i) => (
              <SoleOwnerWorkspace
                key={w.workspaceId}
                workspace={w}
                index={i}
                decision={decisions?.[i]}
                error={decisionError(i)}
                onDecide={(d) => decide(i, d)}
              />
            ))}
          </ul>
        </section>
      ) : null}

      {left.length ? (
        <section aria-labelledby="delete-left-title" className="flex flex-col gap-2">
          <h4 id="delete-left-title" className="text-sm font-semibold">
            Workspaces you leave (they have other owners)
          </h4>
          <ul className="flex flex-col gap-1 text-sm">
            {left.map((w) => (
              <li key={w.workspaceId} className="wrap-anywhere" data-testid="delete-plan-left">
                <span className="font-medium">{w.name}</span> <span className="text-ink-faint">— you are {w.role === 'owner' ? 'one of its owners' : `its ${w.role}`}; it stays as it is</span>
              </li>
            ))}
          </ul>
        </section>
      ) : null}

      <section aria-labelledby="delete-account-goes-title" className="flex flex-col gap-1 text-sm">
        <h4 id="delete-account-goes-title" className="font-semibold">
          What goes with your account
        </h4>
        <ul className="ml-5 list-disc">
          <li>your sign-in, your name and e-mail address, and every session of yours (signed out everywhere)</li>
          <li>{plan.accessTokens ? `your ${plural(plan.accessTokens, 'access token, which stops', 'access tokens, which stop')} working at once` : 'your access tokens (none is active)'}</li>
          {plan.pendingInvitationsSent ? <li>{plural(plan.pendingInvitationsSent, 'invitation', 'invitations')} you sent that nobody accepted yet</li> : null}
        </ul>
        <p className="text-ink-soft">What you saved in workspaces that stay (Systems and their revisions, Lessons, profiles, measurements, share links) is kept for the others there, shown as by “a former member”.</p>
      </section>

      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 md:grid-cols-2">
        <Field id="delete-password" label="Your password" type="password" autoComplete="current-password" {...register('password')} error={errors.password?.message} />
        <Field
          id="delete-confirm"
          label={`Type “${DELETE_ACCOUNT_CONFIRMATION}” to confirm`}
          autoComplete="off"
          spellCheck={false}
          {...register('confirm')}
          error={errors.confirm?.message}
        />
      </div>
      <p className="text-sm font-semibold text-tint-ink-fail">This cannot be undone: a deleted account and deleted workspaces cannot be brought back.</p>
      <div>
        <Button type="submit" variant="danger" disabled={isSubmitting}>
          {isSubmitting ? 'Deleting…' : 'Delete my account'}
        </Button>
      </div>
    </form>
  );
}
