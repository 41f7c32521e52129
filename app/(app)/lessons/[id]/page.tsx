import { notFound } from 'next/navigation';
import { LessonEditor } from '@/components/lessons/lesson-editor';
import { pageCaller } from '@/components/shell/require-caller';
import { getLesson } from '@/lib/data/lessons';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Lesson' };

export default async function LessonPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await pageCaller(`/lessons/${id}`);
  let lesson;
  try {
    lesson = await getLesson(caller, id);
  } catch (e) {
    if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
    throw e;
  }
  return <LessonEditor key={lesson.id} initial={lesson} />;
}
