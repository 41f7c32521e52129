import { notFound } from 'next/navigation';
import { SharedLesson } from '@/components/lessons/shared-lesson';
import { getLessonByShareToken } from '@/lib/data/lessons';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Shared Lesson', robots: { index: false } };

/** The read-only student view of a Lesson's share link (revoked or unknown tokens: not found). */
export default async function SharedLessonPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const lesson = await getLessonByShareToken(token);
  if (!lesson) notFound();
  return <SharedLesson lesson={lesson} />;
}
