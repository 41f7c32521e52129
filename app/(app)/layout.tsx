import type { ReactNode } from 'react';
import { AppHeader } from '@/components/shell/app-header';

export default function AppLayout({ children }: { children: ReactNode }) {
  return (
    <>
      <AppHeader />
      <main id="main" className="mx-auto max-w-[1800px] px-4 py-5">
        {children}
      </main>
    </>
  );
}
