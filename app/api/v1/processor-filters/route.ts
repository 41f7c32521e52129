import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeProcessorFilters } from '@/lib/system-model/processor-filters';
import { processorFiltersRequestSchema } from '@/lib/validations/compute-processor-filters';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** POST /api/v1/processor-filters — filters as digital biquads at a sample rate, against their analog prototypes (fields on the API page /docs/api). */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.processorFilters.query);
  const input = await parseJson(request, processorFiltersRequestSchema);
  return json(ANSWER_SHAPES.processorFilters.apply(computeProcessorFilters(input), shape));
});
