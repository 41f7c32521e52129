'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';

/** The secret of a token just made, shown this once with a Copy button and a curl line; "Done" forgets it. */
export function NewSecret({ name, secret, onDismiss }: { name: string; secret: string; onDismiss: () => void }) {
  const [copy, setCopy] = useState<'idle' | 'copied' | 'failed'>('idle');
  const origin = typeof window === 'undefined' ? '' : window.location.origin;
  const curl = `curl -H "Authorization: Bearer ${secret}" ${origin}/api/v1/systems`;

  async function copySecret() {
    try {
      await navigator.clipboard.writeText(secret);
      setCopy('copied');
    } catch {
      setCopy('failed');
    }
  }

  return (
    <section aria-labelledby="new-secret-title" data-testid="new-secret" className="flex flex-col gap-3 rounded-lg border-2 border-mains bg-tint-info p-4">
      <h3 id="new-secret-title" className="text-base font-semibold">
        Your new token “{name}”
      </h3>
      <p className="text-sm font-semibold text-tint-ink-warn">You will not see it again: copy it now and keep it like a password.</p>
      <div className="flex flex-wrap items-center gap-2">
        <code data-testid="token-secret" aria-label="The token's secret" className="num min-w-0 flex-1 rounded-md border border-line bg-white px-3 py-2 text-sm break-all select-all">
          {secret}
        </code>
        <Button variant="secondary" onClick={() => void copySecret()}>
          Copy
        </Button>
        <p role="status" className="text-sm text-ink-soft">
          {copy === 'copied' ? 'Copied.' : copy === 'failed' ? 'This browser did not let us copy: select the text and copy it yourself.' : ''}
        </p>
      </div>
      <div className="flex flex-col gap-1">
        <p className="text-sm text-ink-soft">Try it from a terminal (it lists the Systems the token can see):</p>
        <pre data-testid="token-curl" className="num overflow-x-auto rounded-md border border-line bg-white px-3 py-2 text-xs whitespace-pre-wrap break-all">
          {curl}
        </pre>
      </div>
      <div>
        <Button onClick={onDismiss}>Done, I have copied it</Button>
      </div>
    </section>
  );
}
