import { resolveSourceCurves } from '@/lib/data/measured-curves';
import { BODY_LIMIT_BYTES, json, parseJson, parseQuery, route } from '@/lib/http';
import { computeTiming } from '@/lib/system-model/timing';
import { timingRequestSchema } from '@/lib/validations/compute-blend';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/**
 * POST /api/v1/timing — arrival times, phase at the crossover, recommended delay and polarity, Timing window, on the
 * model or on measured curves (a source's `measured`: a stored measurement's id or the points); fields in
 * lib/openapi/operations (the API page /docs/api).
 */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.timing.query);
  const input = await parseJson(request, timingRequestSchema, BODY_LIMIT_BYTES.measuredCurves);
  return json(ANSWER_SHAPES.timing.apply(computeTiming(input, await resolveSourceCurves(input)), shape));
});
