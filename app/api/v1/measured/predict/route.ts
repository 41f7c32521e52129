import { resolveCurve } from '@/lib/data/measured-curves';
import { BODY_LIMIT_BYTES, json, parseJson, parseQuery, route } from '@/lib/http';
import { computeMeasured } from '@/lib/system-model/measured';
import { predictRequestSchema } from '@/lib/validations/measurement';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** Inline points need no session; a `measurementId` is read with the caller's workspace rights. */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.measuredPredict.query);
  const input = await parseJson(request, predictRequestSchema, BODY_LIMIT_BYTES.measuredCurves);
  const [mains, sub] = await Promise.all([resolveCurve(input.mains.curve), resolveCurve(input.sub.curve)]);
  return json(ANSWER_SHAPES.measuredPredict.apply(computeMeasured(input, { mains, sub }), shape));
});
