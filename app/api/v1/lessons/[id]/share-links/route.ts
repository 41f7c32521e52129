import { requireCaller } from '@/lib/auth';
import { createLessonShareLink, listLessonShareLinks, revokeLessonShareLink } from '@/lib/data/share-links';
import { json, parseQuery, route } from '@/lib/http';
import { shareTokenQuerySchema } from '@/lib/validations/share-link';

type Ctx = { params: Promise<{ id: string }> };

/** Creates a read-only student link: 201 `{ token, url, lessonId, createdAt, revokedAt }`. Editors and owners. */
export const POST = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await createLessonShareLink(caller, id), 201);
});

/** The Lesson's live links: `{ items }`. Editors and owners. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json({ items: await listLessonShareLinks(caller, id) });
});

/** Revokes `?token=`: the student page answers "not found" from now on. */
export const DELETE = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const { token } = parseQuery(request, shareTokenQuerySchema);
  return json(await revokeLessonShareLink(caller, id, token));
});
