import { requireCaller } from '@/lib/auth';
import { createShareLink, listShareLinks, shareUrl } from '@/lib/data/share-links';
import { json, route } from '@/lib/http';


type Ctx = { params: Promise<{ id: string }> };

/** Creates a read-only link: 201 `{ token, url, createdAt, … }`. Editors and owners. */
export const POST = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const link = await createShareLink(caller, id);
  return json({ ...link, url: shareUrl(link.token) }, 201);
});

/** The System's live (unrevoked) links. Editors and owners. */
export const GET = route<Ctx>(async (_request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const items = await listShareLinks(caller, id);
  return json({ items: items.map((l) => ({ ...l, url: shareUrl(l.token) })) });
});
