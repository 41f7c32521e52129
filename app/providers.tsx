'use client';

import { SessionProvider } from 'next-auth/react';
import type { ReactNode } from 'react';
import { SWRConfig } from 'swr';

export function Providers({ children }: { children: ReactNode }) {
  return (
    <SessionProvider refetchOnWindowFocus={false}>
      <SWRConfig value={{ keepPreviousData: true, revalidateOnFocus: false, dedupingInterval: 2000 }}>{children}</SWRConfig>
    </SessionProvider>
  );
}
