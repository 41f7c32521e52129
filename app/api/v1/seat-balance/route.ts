import { z } from 'zod';
import { getCaller } from '@/lib/auth';
import { getMeasurement } from '@/lib/data/measurements';
import { fromZod, unauthorized } from '@/lib/errors';
import { json, parseJson, parseQuery, route } from '@/lib/http';
import { computeMeasuredSeatBalance, computeSeatBalance } from '@/lib/system-model/seat-balance';
import { seatBalanceMeasuredRequestSchema, seatBalanceModelRequestSchema } from '@/lib/validations/compute-seat-balance';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/**
 * POST /api/v1/seat-balance — documented in lib/openapi/operations (the API page /docs/api). The modal model needs no sign-in;
 * a body with `measurements` reads them with the caller's workspace rights.
 */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.seatBalance.query);
  const raw = await parseJson(request, z.unknown());
  if (raw !== null && typeof raw === 'object' && 'measurements' in raw) {
    const parsed = seatBalanceMeasuredRequestSchema.safeParse(raw);
    if (!parsed.success) throw fromZod(parsed.error);
    const caller = await getCaller();
    if (!caller) throw unauthorized('Sign in to balance the seats from stored measurements.');
    const curves = await Promise.all(parsed.data.measurements.map((m) => getMeasurement(caller, m.measurementId)));
    return json(ANSWER_SHAPES.seatBalance.apply(computeMeasuredSeatBalance(parsed.data, curves), shape));
  }
  const parsed = seatBalanceModelRequestSchema.safeParse(raw);
  if (!parsed.success) throw fromZod(parsed.error);
  return json(ANSWER_SHAPES.seatBalance.apply(computeSeatBalance(parsed.data), shape));
});
