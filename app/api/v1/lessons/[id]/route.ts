import { requireCaller } from '@/lib/auth';
import { deleteLesson, getLesson, updateLesson } from '@/lib/data/lessons';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { lessonUpdateSchema } from '@/lib/validations/lesson';

type Ctx = { params: Promise<{ id: string }> };

/** The Lesson with its `steps` in order. Viewers and up. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await getLesson(caller, id));
});

/** Saves `{ title, description, revision }`; a stale revision is 409 with `currentRevision`, changing nothing. */
export const PUT = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const input = await parseJson(request, lessonUpdateSchema, BODY_LIMIT_BYTES.form);
  return json(await updateLesson(caller, id, input));
});

/** Soft delete; its share links stop answering. */
export const DELETE = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  await deleteLesson(caller, id);
  return json({ id, deleted: true });
});
