import Link from 'next/link';
import type { ReactNode } from 'react';
import { Wordmark } from '@/components/ui/mark';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <main id="main" className="flex min-h-screen flex-col items-center px-4 py-10">
      <Link href="/" aria-label="Seamline home">
        <Wordmark size={34} />
      </Link>
      <div className="mt-8 w-full max-w-md rounded-lg border border-line bg-white p-6 shadow-sm">{children}</div>
    </main>
  );
}
