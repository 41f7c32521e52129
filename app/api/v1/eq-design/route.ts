import { z } from 'zod';
import { getCaller } from '@/lib/auth';
import { getMeasurement } from '@/lib/data/measurements';
import { fromZod, unauthorized } from '@/lib/errors';
import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeEqDesign } from '@/lib/system-model/eq-design';
import { computeMeasuredEqDesign } from '@/lib/system-model/eq-design-measured';
import { eqDesignCurveRequestSchema, eqDesignMeasuredRequestSchema, eqDesignModelRequestSchema } from '@/lib/validations/compute-eq-design';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/**
 * POST /api/v1/eq-design — documented in lib/openapi/operations (the API page /docs/api). An inline curve (`frequencyHz`) or the
 * modal model (`room`) needs no sign-in; a body with `measurements` reads them with the caller's workspace rights.
 */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.eqDesign.query);
  const raw = await parseJson(request, z.unknown());
  const has = (field: string) => raw !== null && typeof raw === 'object' && field in raw;
  if (has('measurements')) {
    const parsed = eqDesignMeasuredRequestSchema.safeParse(raw);
    if (!parsed.success) throw fromZod(parsed.error);
    const caller = await getCaller();
    if (!caller) throw unauthorized('Sign in to design EQ from stored measurements.');
    const curves = await Promise.all(parsed.data.measurements.map((m) => getMeasurement(caller, m.measurementId)));
    return json(ANSWER_SHAPES.eqDesign.apply(computeMeasuredEqDesign(parsed.data, curves), shape));
  }
  const parsed = has('frequencyHz') ? eqDesignCurveRequestSchema.safeParse(raw) : eqDesignModelRequestSchema.safeParse(raw);
  if (!parsed.success) throw fromZod(parsed.error);
  return json(ANSWER_SHAPES.eqDesign.apply(computeEqDesign(parsed.data), shape));
});
