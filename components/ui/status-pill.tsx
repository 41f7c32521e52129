import type { ReactNode } from 'react';

export type PillTone = 'ok' | 'warn' | 'fail' | 'neutral';

const TONES: Record<PillTone, string> = {
  ok: 'bg-tint-ok text-tint-ink-ok',
  warn: 'bg-tint-warn text-tint-ink-warn',
  fail: 'bg-tint-fail text-tint-ink-fail',
  neutral: 'bg-tint-plain text-tint-ink-plain',
};

/** A small coloured verdict, e.g. "✓ pass" on Layout or "✗ fails" on Modes; the icon is hidden from screen readers. */
export function StatusPill({ tone, icon, testId, children }: { tone: PillTone; icon: string; testId?: string; children: ReactNode }) {
  return (
    <span data-testid={testId} className={`inline-flex items-center gap-1 rounded px-1.5 py-0.5 text-xs font-semibold ${TONES[tone]}`}>
      <span aria-hidden="true">{icon}</span>
      {children}
    </span>
  );
}
