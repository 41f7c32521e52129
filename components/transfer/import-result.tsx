import Link from 'next/link';
import { Button } from '@/components/ui/button';
import { Notice } from '@/components/ui/notice';
import type { ApiIssue } from '@/lib/client/api';
import type { TransferImportAnswer } from '@/lib/data/workspace-import';

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

/** "2 Systems (5 revisions), 1 Lesson (7 Steps), 4 Speaker profiles, 16 measurements". */
function createdWords(c: TransferImportAnswer['created']): string {
  return [
    `${plural(c.systems, 'System')} (${plural(c.revisions, 'revision')})`,
    `${plural(c.lessons, 'Lesson')} (${plural(c.steps, 'Step')})`,
    plural(c.profiles, 'Speaker profile'),
    plural(c.measurements, 'measurement'),
  ].join(', ');
}

/** What an import created, with links to the new Systems and Lessons, what was renamed, and the people in the file. */
export function ImportResult({ answer, onOpenWorkspace }: { answer: TransferImportAnswer; onOpenWorkspace: (id: string) => void }) {
  const invite = answer.members.filter((m) => !m.alreadyMember);
  return (
    <div className="flex min-w-0 flex-col gap-3" data-testid="import-result">
      <Notice kind="ok" title={`Imported into ${answer.workspaceName}`}>
        <p data-testid="import-created">Created {createdWords(answer.created)}.</p>
        <p className="mt-1 text-xs">Names, revision numbers, notes and the times in the file were kept; everything has new ids.</p>
      </Notice>
      <div className="flex flex-wrap items-center gap-2">
        <Button variant="secondary" onClick={() => onOpenWorkspace(answer.workspaceId)}>
          Show {answer.workspaceName}
        </Button>
      </div>
      {answer.systems.length ? (
        <div>
          <h4 className="text-sm font-semibold">Systems</h4>
          <ul className="mt-1 flex flex-col gap-1 text-sm">
            {answer.systems.map((s) => (
              <li key={s.id} className="flex flex-wrap gap-x-3 wrap-anywhere">
                <Link href={`/systems/${s.id}`} className="text-mains underline-offset-2 hover:underline">
                  {s.name}
                </Link>
                <Link href={`/library/${s.id}`} className="text-xs text-ink-soft underline-offset-2 hover:underline" aria-label={`History of ${s.name}`}>
                  history
                </Link>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {answer.lessons.length ? (
        <div>
          <h4 className="text-sm font-semibold">Lessons</h4>
          <ul className="mt-1 flex flex-col gap-1 text-sm">
            {answer.lessons.map((l) => (
              <li key={l.id} className="wrap-anywhere">
                <Link href={`/lessons/${l.id}`} className="text-mains underline-offset-2 hover:underline">
                  {l.title}
                </Link>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {answer.renamed.length ? (
        <div>
          <h4 className="text-sm font-semibold">Renamed (the workspace already had these names)</h4>
          <ul className="mt-1 list-disc pl-5 text-sm">
            {answer.renamed.map((r, i) => (
              <li key={i} className="wrap-anywhere">
                {r.kind}: “{r.from}” is “{r.to}”
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {answer.members.length ? (
        <div>
          <h4 className="text-sm font-semibold">Members in the file</h4>
          <p className="text-xs text-ink-soft">An import never adds members. {invite.length ? 'Invite the others from the workspace’s page.' : 'All of them are members here.'}</p>
          <ul className="mt-1 flex flex-col gap-1 text-sm">
            {answer.members.map((m) => (
              <li key={m.email} className="wrap-anywhere">
                {m.email} <span className="text-ink-faint">({m.role})</span> — {m.alreadyMember ? 'a member here' : 'not a member here'}
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {answer.formerMembers.length ? (
        <p className="text-sm text-ink-soft wrap-anywhere">
          Work by {answer.formerMembers.join(', ')} shows “a former member”: they are not members of {answer.workspaceName}.
        </p>
      ) : null}
    </div>
  );
}

/** A refused file: the message and every issue with its part and field. Nothing was changed. */
export function ImportRefusal({ fileName, message, issues, totalIssues }: { fileName: string; message: string; issues: ApiIssue[]; totalIssues: number }) {
  return (
    <div role="alert" data-testid="import-errors" className="rounded-md border border-tint-edge-fail bg-tint-fail px-3 py-2 text-sm text-tint-ink-fail">
      <p className="font-semibold wrap-anywhere">
        {fileName}: {message}
      </p>
      {issues.length ? (
        <ul className="mt-1 max-h-48 list-disc overflow-auto pl-5">
          {issues.map((i, k) => (
            <li key={k} className="wrap-anywhere">
              <span className="num font-medium">{i.path}</span>: {i.message}
            </li>
          ))}
        </ul>
      ) : null}
      {totalIssues > issues.length ? <p className="mt-1">…and {totalIssues - issues.length} more.</p> : null}
      <p className="mt-1 text-xs">Nothing was created or changed.</p>
    </div>
  );
}
