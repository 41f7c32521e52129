'use client';

import type { AccountDeleteFormInput } from '@/lib/validations/account';
import type { DeletionPlanWorkspace } from './use-deletion-plan';

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/** What deleting a workspace removes, as plain lines ("4 Systems and their 19 saved revisions", …). */
function contentLines(c: DeletionPlanWorkspace['ifDeleted']): string[] {
  const lines: string[] = [];
  if (c.systems) lines.push(`${plural(c.systems, 'System', 'Systems')} and ${plural(c.revisions, 'saved revision', 'saved revisions')}`);
  if (c.lessons) lines.push(`${plural(c.lessons, 'Lesson', 'Lessons')} with ${plural(c.steps, 'Step', 'Steps')}`);
  if (c.profiles) lines.push(plural(c.profiles, 'Speaker profile', 'Speaker profiles'));
  if (c.measurements) lines.push(plural(c.measurements, 'measurement', 'measurements'));
  if (c.shareLinks) lines.push(`${plural(c.shareLinks, 'share link, which stops', 'share links, which stop')} working`);
  if (c.members) lines.push(`${plural(c.members, 'other member loses', 'other members lose')} access`);
  return lines;
}

/** A decision as the form holds it: no action until one is chosen. */
export type Decision = Partial<AccountDeleteFormInput['workspaces'][number]> & { toUserId?: string };

/** The select's value for a decision: '' (not chosen), 'delete', or 'transfer:<userId>'. */
const choiceOf = (d: Decision | undefined) => (d?.action === 'delete' ? 'delete' : d?.action === 'transfer' ? `transfer:${d.toUserId ?? ''}` : '');

/** The decision a select value stands for. */
function decisionOf(workspaceId: string, choice: string): Decision {
  if (choice === 'delete') return { workspaceId, action: 'delete' };
  if (choice.startsWith('transfer:')) return { workspaceId, action: 'transfer', toUserId: choice.slice('transfer:'.length) };
  return { workspaceId };
}

/** One workspace the account alone owns: who could take it over, what deleting it removes, and the choice. */
export function SoleOwnerWorkspace({
  workspace,
  index,
  decision,
  error,
  onDecide,
}: {
  workspace: DeletionPlanWorkspace;
  index: number;
  decision: Decision | undefined;
  error: string | undefined;
  onDecide: (decision: Decision) => void;
}) {
  const id = `delete-ws-${index}`;
  const choice = choiceOf(decision);
  const lines = contentLines(workspace.ifDeleted);
  return (
    <li className={`flex flex-col gap-2 rounded-lg border p-3 ${choice === 'delete' ? 'border-fail bg-tint-fail' : 'border-line bg-white'}`} data-testid="delete-plan-owned">
      <div className="flex flex-wrap items-baseline gap-x-2">
        <h4 className="min-w-0 font-semibold wrap-anywhere">{workspace.name}</h4>
        <span className="text-xs text-ink-faint">{workspace.personal ? 'your personal workspace · ' : ''}you are its only owner</span>
      </div>
      <div className="flex min-w-0 flex-col gap-1">
        <label htmlFor={id} className="text-sm font-medium">
          What happens to it
        </label>
        <select
          id={id}
          value={choice}
          onChange={(e) => onDecide(decisionOf(workspace.workspaceId, e.target.value))}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : `${id}-what`}
          className={`w-full min-w-0 rounded-md border bg-white px-3 py-2 text-sm text-ink ${error ? 'border-fail' : 'border-line'}`}
        >
          {workspace.otherMembers.length ? <option value="">Choose…</option> : null}
          {workspace.otherMembers.map((m) => (
            <option key={m.userId} value={`transfer:${m.userId}`}>
              Hand it to {m.name} ({m.role}; they become an owner)
            </option>
          ))}
          <option value="delete">Delete it and everything in it</option>
        </select>
        {error ? (
          <p id={`${id}-error`} role="alert" className="text-sm text-fail">
            {error}
          </p>
        ) : null}
      </div>
      <div id={`${id}-what`} className="text-sm">
        {workspace.otherMembers.length === 0 ? <p className="text-ink-soft">Nobody else is in it, so it can only be deleted.</p> : null}
        {lines.length ? (
          <>
            <p className={choice === 'delete' ? 'font-semibold text-tint-ink-fail' : 'text-ink-soft'}>{choice === 'delete' ? 'Deleted for good, with:' : 'If deleted, these go with it:'}</p>
            <ul className="ml-5 list-disc">
              {lines.map((l) => (
                <li key={l}>{l}</li>
              ))}
            </ul>
          </>
        ) : (
          <p className="text-ink-soft">Nothing is saved in it yet.</p>
        )}
      </div>
    </li>
  );
}
