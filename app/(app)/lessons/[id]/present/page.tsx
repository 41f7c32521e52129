import { notFound } from 'next/navigation';
import { PresenterView } from '@/components/lessons/presenter-view';
import { pageCaller } from '@/components/shell/require-caller';
import { getLesson } from '@/lib/data/lessons';
import { AppError } from '@/lib/errors';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Presenter view' };

export default async function PresentLessonPage({ params, searchParams }: { params: Promise<{ id: string }>; searchParams: Promise<{ step?: string }> }) {
  const { id } = await params;
  const { step } = await searchParams;
  const caller = await pageCaller(`/lessons/${id}/present${step ? `?step=${encodeURIComponent(step)}` : ''}`);
  let lesson;
  try {
    lesson = await getLesson(caller, id);
  } catch (e) {
    if (e instanceof AppError && (e.status === 404 || e.status === 403)) notFound();
    throw e;
  }
  return <PresenterView key={lesson.id} lessonId={lesson.id} title={lesson.title} steps={lesson.steps} initialStep={Number(step ?? 1)} />;
}
