import { requireCaller } from '@/lib/auth';
import { copySharedSystem } from '@/lib/data/share-links';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { copySchema } from '@/lib/validations/library';

type Ctx = { params: Promise<{ token: string }> };

/** Copies a shared System into `{ workspaceId }` where the caller is an editor: 201 with the new System. */
export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { token } = await params;
  const input = await parseJson(request, copySchema, BODY_LIMIT_BYTES.form);
  return json(await copySharedSystem(caller, token, input), 201);
});
