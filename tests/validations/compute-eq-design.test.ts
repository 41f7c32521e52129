import { describe, expect, it } from 'vitest';
import { eqDesignCurveRequestSchema, eqDesignMeasuredRequestSchema, eqDesignModelRequestSchema } from '@/lib/validations/compute-eq-design';

// The request bodies of POST /api/v1/eq-design: defaults filled in, and every refusal names its field path.
// An invented 6 × 4.5 × 2.6 m room and an invented curve.
const room = { lengthM: 6, widthM: 4.5, heightM: 2.6, rt60S: 0.4, temperatureC: 20 };
const seats = [
  { name: 'Left chair', xM: 1.5, yM: 4, zM: 1.1 },
  { name: 'Right chair', xM: 3, yM: 4, zM: 1.1 },
];
const subs = [
  { name: 'Sub one', xM: 0.3, yM: 0.3, zM: 0.3 },
  { name: 'Sub two', xM: 4.2, yM: 3, zM: 0.3 },
];
const MODEL = { room, seats, subs };
const CURVE = { frequencyHz: [20, 30, 40, 60, 80, 120], magnitudeDb: [0, 2, 6, 1, 0, -1] };
const ID = (n: number) => `00000000-0000-4000-8000-00000000000${n}`;
const TOGETHER = { measurements: [{ seat: 'Left chair', measurementId: ID(1) }, { seat: 'Right chair', measurementId: ID(2) }] };
const PER_SUB = {
  subs: [{ name: 'Sub one' }, { name: 'Sub two', delayMs: 1.5, invert: true }],
  measurements: [
    { sub: 'Sub one', seat: 'Left chair', measurementId: ID(1) },
    { sub: 'Sub two', seat: 'Left chair', measurementId: ID(2) },
  ],
};

type Schema = typeof eqDesignCurveRequestSchema | typeof eqDesignModelRequestSchema | typeof eqDesignMeasuredRequestSchema;
const pathsOf = (schema: Schema, body: unknown): string[] => {
  const r = schema.safeParse(body);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};

describe('the designer’s options (every form)', () => {
  it('fill the defaults of issue 16: flat target, 20–120 Hz, 5 filters, +3 dB boost, 15 dB cut, Q 0.5–10, 48 kHz, nulls 8 dB deep', () => {
    const r = eqDesignCurveRequestSchema.parse(CURVE);
    expect(r.target).toEqual({ kind: 'flat' });
    expect(r.band).toEqual({ startHz: 20, stopHz: 120 });
    expect([r.maxFilters, r.maxBoostDb, r.maxCutDb, r.sampleRateHz, r.nullDepthDb]).toEqual([5, 3, 15, 48000, 8]);
    expect(r.q).toEqual({ min: 0.5, max: 10 });
  });

  it.each<[string, string[], Record<string, unknown>]>([
    ['11 filters', ['maxFilters'], { maxFilters: 11 }],
    ['2.5 filters', ['maxFilters'], { maxFilters: 2.5 }],
    ['a boost of 13 dB', ['maxBoostDb'], { maxBoostDb: 13 }],
    ['a negative boost limit', ['maxBoostDb'], { maxBoostDb: -1 }],
    ['a cut of 30 dB', ['maxCutDb'], { maxCutDb: 30 }],
    ['Q limits upside down', ['q.max'], { q: { min: 4, max: 2 } }],
    ['a Q of 25', ['q.max'], { q: { min: 1, max: 25 } }],
    ['a sample rate of 4 kHz', ['sampleRateHz'], { sampleRateHz: 4000 }],
    ['a house rise of 20 dB', ['target.riseDb'], { target: { kind: 'house', riseDb: 20, belowHz: 60 } }],
    ['a house corner of 10 Hz', ['target.belowHz'], { target: { kind: 'house', riseDb: 4, belowHz: 10 } }],
    ['an unknown target', ['target.kind'], { target: { kind: 'bright' } }],
    ['a band upside down', ['band.stopHz'], { band: { startHz: 100, stopHz: 40 } }],
    ['a null depth of 1 dB', ['nullDepthDb'], { nullDepthDb: 1 }],
  ])('refuse %s, naming %s', (_, paths, patch) => {
    expect(pathsOf(eqDesignCurveRequestSchema, { ...CURVE, ...patch })).toEqual(paths);
  });
});

describe('eqDesignCurveRequestSchema', () => {
  it.each<[string, string[], Record<string, unknown>]>([
    ['magnitudes one short', ['magnitudeDb'], { magnitudeDb: [0, 0, 0, 0, 0] }],
    ['a target shape one short', ['targetShapeDb'], { targetShapeDb: [0, 0] }],
    ['frequencies out of order', ['frequencyHz.2'], { frequencyHz: [20, 30, 30, 60, 80, 120] }],
    ['a frequency at the Nyquist frequency', ['frequencyHz.5'], { frequencyHz: [20, 30, 40, 60, 80, 4000], sampleRateHz: 8000 }],
    ['a band holding two points', ['band'], { band: { startHz: 25, stopHz: 50 } }],
    ['two points (and so one magnitude too many, and two points in the band)', ['frequencyHz', 'magnitudeDb', 'band'], { frequencyHz: [20, 30] }],
    ['a magnitude as text', ['magnitudeDb.1'], { magnitudeDb: [0, '2', 6, 1, 0, -1] }],
  ])('refuses %s, naming %s', (_, paths, patch) => {
    expect(pathsOf(eqDesignCurveRequestSchema, { ...CURVE, ...patch })).toEqual(paths);
  });
});

describe('eqDesignModelRequestSchema', () => {
  it('fills the defaults: the power average over the seats, subs at 0 dB / 0 ms / normal polarity with nothing in their path, the Modes grid, following the low-pass', () => {
    const r = eqDesignModelRequestSchema.parse(MODEL);
    expect(r.at).toBe('average');
    expect(r.subs[0]).toEqual({ ...subs[0], gainDb: 0, delayMs: 0, invert: false, rolloffs: [], voicing: [], eq: [] });
    expect(r.grid).toEqual({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
    expect(r.followLowpass).toBe(true);
    expect(r.lowpass).toBeUndefined();
    expect(eqDesignModelRequestSchema.parse({ ...MODEL, at: 'right CHAIR' }).at).toBe('right CHAIR');
  });

  it.each<[string, string[], Record<string, unknown>]>([
    ['no seat', ['seats'], { seats: [] }],
    ['a seat named twice', ['seats.1.name'], { seats: [seats[0], { ...seats[1], name: 'left chair' }] }],
    ['at a seat that is not there', ['at'], { at: 'Back row' }],
    ['a sub beyond the room’s width', ['subs.1.xM'], { subs: [subs[0], { ...subs[1], xM: 5 }] }],
    ['nine subs', ['subs'], { subs: Array.from({ length: 9 }, (_, i) => ({ ...subs[0], name: `Sub ${i}` })) }],
    ['a sub delay of 120 ms', ['subs.0.delayMs'], { subs: [{ ...subs[0], delayMs: 120 }] }],
    ['an unknown roll-off', ['subs.0.rolloffs.0.kind'], { subs: [{ ...subs[0], rolloffs: [{ kind: 'horn' }] }] }],
    ['a shelf in the processor EQ (peaking only)', ['subs.0.eq.0.kind', 'subs.0.eq.0.centerHz', 'subs.0.eq.0.q'], { subs: [{ ...subs[0], eq: [{ kind: 'low-shelf', cornerHz: 50, gainDb: 3 }] }] }],
    ['a Linkwitz–Riley low-pass of order 3', ['lowpass.order'], { lowpass: { family: 'linkwitz-riley', order: 3, cornerHz: 80 } }],
    ['the band outside the grid', ['band'], { grid: { startHz: 30, stopHz: 200, pointsPerOctave: 48 } }],
    ['a grid of 200 points per octave', ['grid.pointsPerOctave'], { grid: { startHz: 15, stopHz: 200, pointsPerOctave: 192 } }],
  ])('refuses %s, naming %s', (_, paths, patch) => {
    expect(pathsOf(eqDesignModelRequestSchema, { ...MODEL, ...patch })).toEqual(paths);
  });
});

describe('eqDesignMeasuredRequestSchema', () => {
  it('takes files of every sub together without `subs`, and files of each sub with each sub’s settings', () => {
    expect(eqDesignMeasuredRequestSchema.parse(TOGETHER).subs).toBeUndefined();
    expect(eqDesignMeasuredRequestSchema.parse(PER_SUB).subs).toEqual([
      { name: 'Sub one', gainDb: 0, delayMs: 0, invert: false },
      { name: 'Sub two', gainDb: 0, delayMs: 1.5, invert: true },
    ]);
  });

  it.each<[string, string[], Record<string, unknown>]>([
    ['no measurement', ['measurements'], { ...TOGETHER, measurements: [] }],
    ['a seat given twice', ['measurements.1'], { measurements: [TOGETHER.measurements[0], { ...TOGETHER.measurements[1], seat: 'LEFT chair' }] }],
    ['a sub named in one file only', ['measurements'], { measurements: [TOGETHER.measurements[0], { ...TOGETHER.measurements[1], sub: 'Sub one' }] }],
    ['per-sub files without `subs`', ['subs'], { measurements: PER_SUB.measurements }],
    ['a file of a sub not listed', ['measurements.1.sub', 'measurements'], { ...PER_SUB, measurements: [PER_SUB.measurements[0], { ...PER_SUB.measurements[1], sub: 'Sub three' }] }],
    ['a sub missing at a seat', ['measurements'], { ...PER_SUB, measurements: [PER_SUB.measurements[0]] }],
    ['an id that is not one', ['measurements.0.measurementId'], { measurements: [{ seat: 'Left chair', measurementId: '42' }] }],
  ])('refuses %s, naming %s', (_, paths, patch) => {
    expect(pathsOf(eqDesignMeasuredRequestSchema, patch)).toEqual(paths);
  });
});
