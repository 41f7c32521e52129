import { Suspense } from 'react';
import { SystemEditor } from '@/components/editor/system-editor';
import { getSessionCaller } from '@/lib/auth';

export const metadata = { title: 'New System' };

export default async function NewSystemPage() {
  const caller = await getSessionCaller();
  return (
    <Suspense>
      <SystemEditor signedIn={Boolean(caller)} />
    </Suspense>
  );
}
