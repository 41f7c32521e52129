import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeLayout } from '@/lib/system-model/layout';
import { layoutRequestSchema } from '@/lib/validations/compute-layout';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** POST /api/v1/layout — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.layout.query);
  const input = await parseJson(request, layoutRequestSchema);
  return json(ANSWER_SHAPES.layout.apply(computeLayout(input), shape));
});
