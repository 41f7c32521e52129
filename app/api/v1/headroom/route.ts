import { json, parseJson, route } from '@/lib/http';
import { computeHeadroom } from '@/lib/system-model/headroom';
import { headroomRequestSchema } from '@/lib/validations/compute-headroom';

/** POST /api/v1/headroom — documented in lib/api-docs/compute-room.ts. No sign-in needed. */
export const POST = route(async (request) => {
  const input = await parseJson(request, headroomRequestSchema);
  return json(computeHeadroom(input));
});
