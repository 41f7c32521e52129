import { getCaller } from '@/lib/auth';
import { getMeasurement } from '@/lib/data/measurements';
import { unauthorized } from '@/lib/errors';
import { BODY_LIMIT_BYTES, json, parseJson, route } from '@/lib/http';
import { computeMeasured, type CurvePoints } from '@/lib/system-model/measured';
import { predictRequestSchema, type MeasuredCurveInput } from '@/lib/validations/measurement';

/** Inline points need no session; a `measurementId` is read with the caller's workspace rights. */
async function curvePoints(curve: MeasuredCurveInput): Promise<CurvePoints> {
  if ('measurementId' in curve) {
    const caller = await getCaller();
    if (!caller) throw unauthorized('Sign in to predict from stored measurements, or send the points inline.');
    const m = await getMeasurement(caller, curve.measurementId);
    return { frequencyHz: m.frequencyHz, magnitudeDb: m.magnitudeDb, phaseDeg: m.phaseDeg };
  }
  return { frequencyHz: curve.frequencyHz, magnitudeDb: curve.magnitudeDb, phaseDeg: curve.phaseDeg ?? null };
}

export const POST = route(async (request) => {
  const input = await parseJson(request, predictRequestSchema, BODY_LIMIT_BYTES.measuredCurves);
  const [mains, sub] = await Promise.all([curvePoints(input.mains.curve), curvePoints(input.sub.curve)]);
  return json(computeMeasured(input, { mains, sub }));
});
