import { json, parseJson, route } from '@/lib/http';
import { computeCrossoverSweep } from '@/lib/system-model/crossover-sweep';
import { crossoverSweepRequestSchema } from '@/lib/validations/compute-blend';

/** POST /api/v1/crossover-sweep — candidate crossover points for one pairing, ranked (fields in lib/api-docs/compute-blend.ts). */
export const POST = route(async (request) => {
  const input = await parseJson(request, crossoverSweepRequestSchema);
  return json(computeCrossoverSweep(input));
});
