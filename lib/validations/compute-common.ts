import { z } from 'zod';

/** Limits that keep the compute routes safe (issue 4): answered 400 or 413 with the field named. */
export const COMPUTE_LIMITS = {
  maxPaths: 16,
  maxGridPoints: 4000,
  minHz: 10,
  maxHz: 24000,
  bodyBytes: 256 * 1024,
} as const;

/** A finite number within [min, max], with a message that names the field's range and unit. */
export const num = (min: number, max: number, unit = '') =>
  z
    .number({ error: (i) => (i.input === undefined ? 'is required' : 'must be a finite number') })
    .min(min, `must be at least ${min}${unit ? ` ${unit}` : ''}`)
    .max(max, `must be at most ${max}${unit ? ` ${unit}` : ''}`);

export const temperatureCSchema = num(-20, 50, '°C');

export const gridSchema = z
  .object({
    startHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz'),
    stopHz: num(COMPUTE_LIMITS.minHz, COMPUTE_LIMITS.maxHz, 'Hz'),
    pointsPerOctave: num(1, 384),
  })
  .superRefine((g, ctx) => {
    if (g.stopHz <= g.startHz) ctx.addIssue({ code: 'custom', path: ['stopHz'], message: 'must be above startHz' });
    const points = Math.floor(Math.log2(g.stopHz / g.startHz) * g.pointsPerOctave) + 1;
    if (points > COMPUTE_LIMITS.maxGridPoints) {
      ctx.addIssue({ code: 'custom', path: ['pointsPerOctave'], message: `the grid would have ${points} points; at most ${COMPUTE_LIMITS.maxGridPoints} are allowed` });
    }
  });

export const pointMSchema = z.object({ xM: num(0, 100, 'm'), yM: num(0, 100, 'm'), zM: num(0, 30, 'm') });

export const roomDimensionsSchema = z.object({ lengthM: num(1, 100, 'm'), widthM: num(1, 100, 'm'), heightM: num(1, 30, 'm') });
