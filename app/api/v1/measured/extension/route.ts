import { getCaller } from '@/lib/auth';
import { getMeasurement } from '@/lib/data/measurements';
import { unauthorized } from '@/lib/errors';
import { BODY_LIMIT_BYTES, json, parseJson, parseQuery, route } from '@/lib/http';
import { computeMeasuredExtension, type ExtensionCurvePoints } from '@/lib/system-model/measured-extension';
import { extensionRequestSchema, type ExtensionCurveInput } from '@/lib/validations/measured-extension';
import { ANSWER_SHAPES } from '@/lib/openapi/answer-shapes';

/** Inline points need no session; a `measurementId` is read with the caller's workspace rights. */
async function curvePoints(curve: ExtensionCurveInput): Promise<ExtensionCurvePoints> {
  if ('measurementId' in curve) {
    const caller = await getCaller();
    if (!caller) throw unauthorized('Sign in to use stored measurements, or send the points inline.');
    const m = await getMeasurement(caller, curve.measurementId);
    return { name: curve.name ?? m.name, frequencyHz: m.frequencyHz, magnitudeDb: m.magnitudeDb };
  }
  return { ...(curve.name ? { name: curve.name } : {}), frequencyHz: curve.frequencyHz, magnitudeDb: curve.magnitudeDb };
}

/** POST /api/v1/measured/extension — a source's in-room −3/−6/−10 dB points (several seats: their spatial average) and a crossover judged against them. */
export const POST = route(async (request) => {
  const shape = parseQuery(request, ANSWER_SHAPES.measuredExtension.query);
  const input = await parseJson(request, extensionRequestSchema, BODY_LIMIT_BYTES.measuredCurves);
  const curves = await Promise.all(input.curves.map(curvePoints));
  return json(ANSWER_SHAPES.measuredExtension.apply(computeMeasuredExtension(input, curves), shape));
});
