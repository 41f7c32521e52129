import Link from 'next/link';
import { LinkMessage } from './link-message';

export const metadata = { title: 'Link not found' };

export default function SharedNotFound() {
  return (
    <LinkMessage title="This share link does not work" testId="shared-not-found">
      <p className="text-ink-soft">It was revoked, the System behind it was deleted, or the address is not complete. Ask whoever sent it for a new link.</p>
      <Link href="/systems/new" className="font-medium text-mains underline">
        Open the editor instead
      </Link>
    </LinkMessage>
  );
}
