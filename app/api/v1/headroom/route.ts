import { json, parseJson, route } from '@/lib/http';
import { computeHeadroom } from '@/lib/system-model/headroom';
import { headroomRequestSchema } from '@/lib/validations/compute-headroom';

/** POST /api/v1/headroom — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const input = await parseJson(request, headroomRequestSchema);
  return json(computeHeadroom(input));
});
