import Link from 'next/link';
import { Wordmark } from '@/components/ui/mark';

export const metadata = { title: 'Link not found' };

export default function SharedNotFound() {
  return (
    <main id="main" className="mx-auto flex min-h-[70vh] max-w-lg flex-col items-start justify-center gap-4 px-4">
      <Link href="/" aria-label="Seamline home">
        <Wordmark size={28} />
      </Link>
      <h1 className="text-2xl font-semibold" data-testid="shared-not-found">
        This share link does not work
      </h1>
      <p className="text-ink-soft">It was revoked, the System behind it was deleted, or the address is not complete. Ask whoever sent it for a new link.</p>
      <Link href="/systems/new" className="font-medium text-mains underline">
        Open the editor instead
      </Link>
    </main>
  );
}
