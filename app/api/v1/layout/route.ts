import { json, parseJson, route } from '@/lib/http';
import { computeLayout } from '@/lib/system-model/layout';
import { layoutRequestSchema } from '@/lib/validations/compute-layout';

/** POST /api/v1/layout — documented in lib/openapi/operations (the API page /docs/api). No sign-in needed. */
export const POST = route(async (request) => {
  const input = await parseJson(request, layoutRequestSchema);
  return json(computeLayout(input));
});
