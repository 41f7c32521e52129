import { json, parseJson, route } from '@/lib/http';
import { computeTiming } from '@/lib/system-model/timing';
import { timingRequestSchema } from '@/lib/validations/compute-blend';

/** POST /api/v1/timing — arrival times, phase at the crossover, recommended delay and polarity, Timing window (fields in lib/api-docs/compute-blend.ts). */
export const POST = route(async (request) => {
  const input = await parseJson(request, timingRequestSchema);
  return json(computeTiming(input));
});
