import { requireCaller } from '@/lib/auth';
import { duplicateSystem } from '@/lib/data/systems';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { systemDuplicateSchema } from '@/lib/validations/library';

type Ctx = { params: Promise<{ id: string }> };

/** Copies the current revision as a new System (`{ name?, workspaceId? }`, default: same workspace, "… (copy)"). */
export const POST = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const hasBody = (request.headers.get('content-length') ?? '0') !== '0' || request.headers.get('content-type');
  const options = hasBody ? await parseJson(request, systemDuplicateSchema, BODY_LIMIT_BYTES.form) : {};
  return json(await duplicateSystem(caller, id, options), 201);
});
