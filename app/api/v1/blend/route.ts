import { json, parseJson, route } from '@/lib/http';
import { computeBlend } from '@/lib/system-model/blend-compute';
import { blendRequestSchema } from '@/lib/validations/compute-blend';

/** POST /api/v1/blend — the complex sum of up to 16 paths and its read-outs (SPEC §6; fields in lib/api-docs/compute-blend.ts). */
export const POST = route(async (request) => {
  const input = await parseJson(request, blendRequestSchema);
  return json(computeBlend(input));
});
