import { StatusPill } from '@/components/ui/status-pill';

/** An angle check's verdict: "✓ pass", "! warn" or "– not checked" (a channel the template does not list). */
export function LayoutBadge({ status, testId }: { status: 'pass' | 'warn' | 'unlisted'; testId?: string }) {
  return (
    <StatusPill tone={status === 'pass' ? 'ok' : status === 'warn' ? 'warn' : 'neutral'} icon={status === 'pass' ? '✓' : status === 'warn' ? '!' : '–'} testId={testId}>
      {status === 'unlisted' ? 'not checked' : status}
    </StatusPill>
  );
}
