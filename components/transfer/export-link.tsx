import type { ReactNode } from 'react';
import { buttonClass } from '@/components/ui/button';

/** A download of a transfer file: a plain link the browser saves (the session cookie goes with it). */
export function ExportLink({ href, label, children }: { href: string; label?: string; children: ReactNode }) {
  return (
    <a href={href} download className={buttonClass('secondary')} aria-label={label} data-testid="transfer-export">
      {children}
    </a>
  );
}
