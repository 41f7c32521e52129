import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeBlend } from '@/lib/system-model/blend';
import { blendRequestSchema } from '@/lib/validations/compute-blend';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** POST /api/v1/blend — the complex sum of up to 16 paths and its read-outs (fields on the API page /docs/api). */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.blend.query);
  const input = await parseJson(request, blendRequestSchema);
  return json(ANSWER_SHAPES.blend.apply(computeBlend(input), shape));
});
