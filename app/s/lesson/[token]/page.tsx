import { redirect } from 'next/navigation';

/** Older lesson links (/s/lesson/{token}) lead to the one share page. */
export default async function SharedLessonRedirect({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  redirect(`/s/${encodeURIComponent(token)}`);
}
