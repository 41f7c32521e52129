import type { ReactNode } from 'react';
import { formatNumber } from '@/components/charts';
import { Button } from '@/components/ui/button';
import type { AdviceAnswer } from '@/lib/system-model/advice-answer';
import type { TimingAnswer } from '@/lib/system-model/timing';

/** What a piece of advice changes, in processor settings: "Sub front left 3.20 ms (was 1.00), inverted (flip it); mains 0.00 ms (was 0.92)". */
export function describeChanges(advice: AdviceAnswer, data: TimingAnswer): string {
  const parts: string[] = [];
  advice.set.subs.forEach((s, k) => {
    const now = data.subs[k];
    if (!now) return;
    const delay = Math.abs(s.delayMs - now.delayMs) >= 0.005 ? `${s.name} delay ${formatNumber(s.delayMs, 2)} ms (now ${formatNumber(now.delayMs, 2)})` : null;
    const polarity = s.invert !== now.invert ? `${delay ? '' : `${s.name} `}polarity ${s.invert ? 'inverted' : 'normal'} (flip it)` : null;
    if (delay || polarity) parts.push([delay, polarity].filter(Boolean).join(', '));
  });
  if (Math.abs(advice.set.mainsDelayMs - data.mains.delayMs) >= 0.005) parts.push(`${data.mains.name} delay ${formatNumber(advice.set.mainsDelayMs, 2)} ms (now ${formatNumber(data.mains.delayMs, 2)})`);
  return parts.length ? `Set ${parts.join('; ')}` : 'No change';
}

/** One piece of advice: "keep" with its reason, or the settings to make, what they gain, and Apply. */
export function AdviceCard({ title, advice, data, testId, readOnly, onApply, children }: { title: ReactNode; advice: AdviceAnswer; data: TimingAnswer; testId: string; readOnly: boolean; onApply: () => void; children?: ReactNode }) {
  return (
    <div className="flex flex-col gap-2 rounded-md border border-line bg-white p-3" data-testid={testId}>
      <p className="text-xs text-ink-soft">{title}</p>
      {advice.keep ? (
        <p className="text-base font-semibold text-ok" data-testid={`${testId}-text`}>
          Keep the present setting
        </p>
      ) : (
        <p className="text-base font-semibold" data-testid={`${testId}-text`}>
          {describeChanges(advice, data)}
        </p>
      )}
      <p className="num text-xs text-ink-soft" data-testid={`${testId}-reason`}>
        {advice.reason}
      </p>
      {children}
      {advice.keep ? null : (
        <Button variant="secondary" className="self-start" disabled={readOnly} data-testid={`${testId}-apply`} onClick={onApply}>
          Apply
        </Button>
      )}
    </div>
  );
}
