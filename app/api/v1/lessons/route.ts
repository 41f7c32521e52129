import { requireCaller } from '@/lib/auth';
import { createLesson, listLessons } from '@/lib/data/lessons';
import { BODY_LIMIT_BYTES, json, parseJson, parseQuery, route } from '@/lib/http';
import { lessonCreateSchema, lessonListQuerySchema } from '@/lib/validations/lesson';

/** The caller's Lessons across their workspaces (`?workspaceId=` for one): `{ items }`, newest change first. */
export const GET = route(async (request) => {
  const caller = await requireCaller();
  const query = parseQuery(request, lessonListQuerySchema);
  return json({ items: await listLessons(caller, query) });
});

/** Creates `{ title, description?, workspaceId? }` (default: the caller's own workspace): 201 with the Lesson. */
export const POST = route(async (request) => {
  const caller = await requireCaller();
  const input = await parseJson(request, lessonCreateSchema, BODY_LIMIT_BYTES.form);
  return json(await createLesson(caller, input), 201);
});
