import { resolveSourceCurves } from '@/lib/data/measured-curves';
import { BODY_LIMIT_BYTES, json, parseJson, parseQuery, route } from '@/lib/http';
import { computeCrossoverSweep } from '@/lib/system-model/crossover-sweep';
import { crossoverSweepRequestSchema } from '@/lib/validations/compute-blend';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/**
 * POST /api/v1/crossover-sweep — candidate crossover points for the pairings, ranked, on the model or on measured
 * curves (a source's `measured`: a stored measurement's id or the points); fields in lib/openapi/operations (the API page /docs/api).
 */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.crossoverSweep.query);
  const input = await parseJson(request, crossoverSweepRequestSchema, BODY_LIMIT_BYTES.measuredCurves);
  return json(ANSWER_SHAPES.crossoverSweep.apply(computeCrossoverSweep(input, await resolveSourceCurves(input)), shape));
});
