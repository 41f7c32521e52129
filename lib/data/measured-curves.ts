import { getCaller } from '@/lib/auth';
import { unauthorized } from '@/lib/errors';
import type { CurvePoints } from '@/lib/system-model/measured-sources';
import type { MeasuredCurveInput } from '@/lib/validations/measured-curve';
import { getMeasurement } from './measurements';

/**
 * The points of a measured curve in a compute request: inline points need no session; a `measurementId` is read with
 * the caller's workspace rights (401 signed out, 404 when not theirs to read), with its arrival when it was an impulse.
 */
export async function resolveCurve(curve: MeasuredCurveInput): Promise<CurvePoints> {
  if ('measurementId' in curve) {
    const caller = await getCaller();
    if (!caller) throw unauthorized('Sign in to use stored measurements, or send the points inline.');
    const m = await getMeasurement(caller, curve.measurementId);
    return { frequencyHz: m.frequencyHz, magnitudeDb: m.magnitudeDb, phaseDeg: m.phaseDeg, arrivalMs: m.arrivalMs };
  }
  return { frequencyHz: curve.frequencyHz, magnitudeDb: curve.magnitudeDb, phaseDeg: curve.phaseDeg ?? null, arrivalMs: null };
}

/** The curves of a Timing or Crossover sweep request's measured sources (null for a modelled source). */
export async function resolveSourceCurves(req: {
  mains: { measured?: MeasuredCurveInput | undefined };
  subs: readonly { measured?: MeasuredCurveInput | undefined }[];
}): Promise<{ mains: CurvePoints | null; subs: (CurvePoints | null)[] }> {
  const one = (c: MeasuredCurveInput | undefined) => (c ? resolveCurve(c) : Promise.resolve(null));
  const [mains, ...subs] = await Promise.all([one(req.mains.measured), ...req.subs.map((s) => one(s.measured))]);
  return { mains: mains ?? null, subs };
}
