import { getCaller } from '@/lib/auth';
import { getMeasurement } from '@/lib/data/measurements';
import { unauthorized } from '@/lib/errors';
import { BODY_LIMIT_BYTES, json, parseJson, parseQuery, route } from '@/lib/http';
import { computeMeasuredCompare, type CompareRunPoints } from '@/lib/system-model/measured-compare';
import { compareRequestSchema, type CompareCurveInput } from '@/lib/validations/measured-compare';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** Inline points need no session; a `measurementId` is read with the caller's workspace rights. */
async function runPoints(curve: CompareCurveInput, fallbackName: string): Promise<CompareRunPoints> {
  if ('measurementId' in curve) {
    const caller = await getCaller();
    if (!caller) throw unauthorized('Sign in to compare stored measurements, or send the points inline.');
    const m = await getMeasurement(caller, curve.measurementId);
    return { name: curve.name ?? m.name, frequencyHz: m.frequencyHz, magnitudeDb: m.magnitudeDb };
  }
  return { name: curve.name ?? fallbackName, frequencyHz: curve.frequencyHz, magnitudeDb: curve.magnitudeDb };
}

/** POST /api/v1/measured/compare — runs as differences from a reference run (dB), smoothed, levels as measured or matched over a band. */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.measuredCompare.query);
  const input = await parseJson(request, compareRequestSchema, BODY_LIMIT_BYTES.measuredCurves);
  const [reference, ...others] = await Promise.all([runPoints(input.reference, 'Reference'), ...input.others.map((c, k) => runPoints(c, `Run ${k + 1}`))]);
  return json(ANSWER_SHAPES.measuredCompare.apply(computeMeasuredCompare(input, reference!, others), shape));
});
