import { requireCaller } from '@/lib/auth';
import { createShareLink, listShareLinks } from '@/lib/data/share-links';
import { json, route } from '@/lib/http';

type Ctx = { params: Promise<{ id: string }> };

/** Creates a read-only link: 201 `{ token, url, createdAt, … }`. Editors and owners. */
export const POST = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json(await createShareLink(caller, id), 201);
});

/** The System's live (unrevoked) links. Editors and owners. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  return json({ items: await listShareLinks(caller, id) });
});
