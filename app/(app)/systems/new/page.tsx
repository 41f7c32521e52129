import { Suspense } from 'react';
import { SystemEditor } from '@/components/editor/system-editor';
import { getCaller } from '@/lib/auth';

export const metadata = { title: 'New System' };

export default async function NewSystemPage() {
  const caller = await getCaller();
  return (
    <Suspense>
      <SystemEditor signedIn={Boolean(caller)} />
    </Suspense>
  );
}
