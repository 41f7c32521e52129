import { json, parseJson, route } from '@/lib/http';
import { computeBlend } from '@/lib/system-model/blend';
import { blendRequestSchema } from '@/lib/validations/compute-blend';

/** POST /api/v1/blend — the complex sum of up to 16 paths and its read-outs (fields on the API page /docs/api). */
export const POST = route(async (request) => {
  const input = await parseJson(request, blendRequestSchema);
  return json(computeBlend(input));
});
