'use client';

import { useEffect, useState } from 'react';

type Copied = 'idle' | 'copied' | 'failed';

/**
 * Copies `text` to the clipboard and says so beside the button for a moment ("Copied" / "Copy failed"), announced to
 * screen readers. Where the browser refuses the clipboard the text is shown to select by hand.
 */
export function CopyButton({ text, label, children, testId }: { text: string; label: string; children: string; testId?: string }) {
  const [state, setState] = useState<Copied>('idle');
  useEffect(() => {
    if (state !== 'copied') return;
    const timer = setTimeout(() => setState('idle'), 2500);
    return () => clearTimeout(timer);
  }, [state]);
  const copy = async () => {
    try {
      if (!navigator.clipboard) throw new Error('no clipboard');
      await navigator.clipboard.writeText(text);
      setState('copied');
    } catch {
      setState('failed');
    }
  };
  return (
    <span className="inline-flex flex-wrap items-center gap-1.5">
      <button
        type="button"
        aria-label={label}
        data-testid={testId}
        onClick={() => void copy()}
        className="inline-flex min-h-8 items-center rounded-md border border-edge bg-white px-2.5 py-1 text-xs text-ink hover:bg-paper focus-visible:outline-2 focus-visible:outline-offset-1 focus-visible:outline-ink"
      >
        {children}
      </button>
      <span role="status" className="text-xs text-ok">
        {state === 'copied' ? 'Copied' : ''}
      </span>
      {state === 'failed' ? (
        <span className="flex basis-full flex-col gap-0.5 text-xs text-fail">
          The browser did not allow copying; select the text:
          <textarea readOnly value={text} rows={Math.min(6, text.split('\n').length)} aria-label={`${label}: text to copy`} className="num w-full min-w-0 rounded border border-line p-1 text-ink" onFocus={(e) => e.currentTarget.select()} />
        </span>
      ) : null}
    </span>
  );
}
