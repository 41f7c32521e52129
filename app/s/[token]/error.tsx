'use client';

import { Button } from '@/components/ui/button';
import { LinkMessage } from './link-message';

/**
 * A share page that could not be read (the database not answering, most often). Not "not found": the link may well
 * work, so it says to try again rather than to ask for a new link.
 */
export default function SharedError({ reset }: { error: Error & { digest?: string }; reset: () => void }) {
  return (
    <LinkMessage title="This shared page could not load" testId="shared-error">
      <p className="text-ink-soft">Seamline could not read it just now. The link itself has not changed: try again in a few seconds.</p>
      <Button onClick={reset}>Try again</Button>
    </LinkMessage>
  );
}
