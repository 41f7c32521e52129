import { json, parseJson, route } from '@/lib/http';
import { computeProcessorFilters } from '@/lib/system-model/processor-filters';
import { processorFiltersRequestSchema } from '@/lib/validations/compute-processor-filters';

/** POST /api/v1/processor-filters — filters as digital biquads at a sample rate, against their analog prototypes (fields on the API page /docs/api). */
export const POST = route(async (request) => {
  const input = await parseJson(request, processorFiltersRequestSchema);
  return json(computeProcessorFilters(input));
});
