import { redirect } from 'next/navigation';
import { getCaller } from '@/lib/auth';

/** For signed-in pages: the caller, or a redirect to sign-in that comes back here. */
export async function pageCaller(returnTo: string) {
  const caller = await getCaller();
  if (!caller) redirect(`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`);
  return caller;
}
