import Link from 'next/link';
import type { ReactNode } from 'react';
import { Wordmark } from '@/components/ui/mark';

/** The frame of a share link's message pages (not found, could not load): the mark, a heading and what to do. */
export function LinkMessage({ title, testId, children }: { title: string; testId: string; children: ReactNode }) {
  return (
    <main id="main" className="mx-auto flex min-h-[70vh] max-w-lg flex-col items-start justify-center gap-4 px-4">
      <Link href="/" aria-label="Seamline home">
        <Wordmark size={28} />
      </Link>
      <h1 className="text-2xl font-semibold" data-testid={testId}>
        {title}
      </h1>
      {children}
    </main>
  );
}
