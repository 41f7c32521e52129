import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeHeadroom } from '@/lib/system-model/headroom';
import { headroomRequestSchema } from '@/lib/validations/compute-headroom';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** POST /api/v1/headroom — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.headroom.query);
  const input = await parseJson(request, headroomRequestSchema);
  return json(ANSWER_SHAPES.headroom.apply(computeHeadroom(input), shape));
});
