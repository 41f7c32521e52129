import type { ReactNode } from 'react';
import { AppHeader } from '@/components/shell/app-header';

export default function MarketingLayout({ children }: { children: ReactNode }) {
  return (
    <>
      <AppHeader />
      <main id="main">{children}</main>
    </>
  );
}
