import { describe, expect, it } from 'vitest';
import { seatBalanceMeasuredRequestSchema, seatBalanceModelRequestSchema } from '@/lib/validations/compute-seat-balance';

// The request bodies of POST /api/v1/seat-balance: defaults filled in, and every refusal names its field path.
// An invented 6 × 4.5 × 2.6 m room.
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
const ID = (n: number) => `00000000-0000-4000-8000-00000000000${n}`;
const MEASURED = {
  seats: [{ name: 'Left chair' }, { name: 'Right chair' }],
  subs: [{ name: 'Sub one' }, { name: 'Sub two' }],
  measurements: [
    { sub: 'Sub one', seat: 'Left chair', measurementId: ID(1) },
    { sub: 'Sub one', seat: 'Right chair', measurementId: ID(2) },
    { sub: 'Sub two', seat: 'Left chair', measurementId: ID(3) },
    { sub: 'Sub two', seat: 'Right chair', measurementId: ID(4) },
  ],
};

const pathsOf = (schema: typeof seatBalanceModelRequestSchema | typeof seatBalanceMeasuredRequestSchema, body: unknown): string[] => {
  const r = schema.safeParse(body);
  return r.success ? [] : r.error.issues.map((i) => i.path.join('.'));
};
const modelPaths = (patch: Record<string, unknown>) => pathsOf(seatBalanceModelRequestSchema, { ...MODEL, ...patch });
const measuredPaths = (patch: Record<string, unknown>) => pathsOf(seatBalanceMeasuredRequestSchema, { ...MEASURED, ...patch });

describe('seatBalanceModelRequestSchema', () => {
  it('fills the defaults: band 20–120 Hz, limits 0–20 ms, −12…+6 dB, inversion allowed, 3 dB floor, seed 1, no grid, no placement', () => {
    const r = seatBalanceModelRequestSchema.parse(MODEL);
    expect(r.band).toEqual({ startHz: 20, stopHz: 120 });
    expect(r.limits).toEqual({ maxDelayMs: 20, minGainDb: -12, maxGainDb: 6, allowInvert: true, maxOutputLossDb: 3 });
    expect(r.seed).toBe(1);
    expect(r.grid).toBeUndefined();
    expect(r.placement).toBeUndefined();
    // A partial limits object keeps what it gives and fills the rest.
    expect(seatBalanceModelRequestSchema.parse({ ...MODEL, limits: { maxDelayMs: 5 } }).limits).toEqual({ maxDelayMs: 5, minGainDb: -12, maxGainDb: 6, allowInvert: true, maxOutputLossDb: 3 });
    const placing = seatBalanceModelRequestSchema.parse({ ...MODEL, placement: { count: 2 } }).placement;
    expect(placing).toEqual({ count: 2, candidates: [], defaults: true, maxCombinations: 200 });
  });

  it.each<[string, string[], Record<string, unknown>]>([
    ['fewer than 2 seats', ['seats'], { seats: [seats[0]] }],
    ['more than 16 seats', ['seats'], { seats: Array.from({ length: 17 }, (_, i) => ({ ...seats[0], name: `Seat ${i}` })) }],
    ['no sub', ['subs'], { subs: [] }],
    ['more than 8 subs', ['subs'], { subs: Array.from({ length: 9 }, (_, i) => ({ ...subs[0], name: `Sub ${i}` })) }],
    ['two seats of one name (case aside)', ['seats.1.name'], { seats: [seats[0], { ...seats[1], name: 'LEFT CHAIR' }] }],
    ['two subs of one name', ['subs.1.name'], { subs: [subs[0], { ...subs[1], name: 'Sub one' }] }],
    ['stopHz at startHz', ['band.stopHz'], { band: { startHz: 60, stopHz: 60 } }],
    ['band outside the grid', ['band'], { grid: { startHz: 30, stopHz: 200, pointsPerOctave: 24 } }],
    ['grid stopHz below startHz', ['grid.stopHz', 'band'], { band: { startHz: 20, stopHz: 20.5 }, grid: { startHz: 100, stopHz: 50, pointsPerOctave: 12 } }],
    ['too many band points', ['grid.pointsPerOctave'], { grid: { startHz: 20, stopHz: 120, pointsPerOctave: 192 } }],
    ['a seat beyond the width', ['seats.1.xM'], { seats: [seats[0], { ...seats[1], xM: 5 }] }],
    ['a sub beyond the length', ['subs.0.yM'], { subs: [{ ...subs[0], yM: 6.5 }, subs[1]] }],
    ['a sub above the ceiling', ['subs.1.zM'], { subs: [subs[0], { ...subs[1], zM: 3 }] }],
    ['a negative position', ['seats.0.yM'], { seats: [{ ...seats[0], yM: -0.1 }, seats[1]] }],
    ['every seat of weight 0', ['seats'], { seats: seats.map((s) => ({ ...s, weight: 0 })) }],
    ['a weight above 10', ['seats.0.weight'], { seats: [{ ...seats[0], weight: 11 }, seats[1]] }],
    ['a delay limit above 50 ms', ['limits.maxDelayMs'], { limits: { maxDelayMs: 60 } }],
    ['a positive minGainDb', ['limits.minGainDb'], { limits: { minGainDb: 1 } }],
    ['allowInvert as text', ['limits.allowInvert'], { limits: { allowInvert: 'yes' } }],
    ['a fractional seed', ['seed'], { seed: 1.5 }],
    ['placement count above the candidates', ['placement.count'], { placement: { count: 3, defaults: false, candidates: [{ name: 'Spot A', xM: 1, yM: 1, zM: 0.2 }, { name: 'Spot B', xM: 2, yM: 1, zM: 0.2 }] } }],
    ['a candidate beyond the width', ['placement.candidates.0.xM'], { placement: { count: 2, candidates: [{ name: 'Spot A', xM: 9, yM: 1, zM: 0.2 }] } }],
    ['a candidate beyond the length', ['placement.candidates.0.yM'], { placement: { count: 2, candidates: [{ name: 'Spot A', xM: 1, yM: 9, zM: 0.2 }] } }],
    ['a candidate above the ceiling', ['placement.candidates.0.zM'], { placement: { count: 2, candidates: [{ name: 'Spot A', xM: 1, yM: 1, zM: 9 }] } }],
    ['more than 16 added candidates', ['placement.candidates'], { placement: { count: 2, candidates: Array.from({ length: 17 }, (_, i) => ({ name: `Spot ${i}`, xM: 1, yM: 1, zM: 0.2 })) } }],
    ['maxCombinations above 200', ['placement.maxCombinations'], { placement: { count: 2, maxCombinations: 201 } }],
    ['a room whose modal sum is too big', ['band.stopHz'], { room: { ...room, lengthM: 60, widthM: 40, heightM: 20 }, band: { startHz: 20, stopHz: 400 } }],
  ])('refuses %s, naming %j', (_, expected, patch) => {
    // A path may be named by two rules at once (a negative position: the number's range and the room's walls).
    expect([...new Set(modelPaths(patch))].sort()).toEqual([...new Set(expected)].sort());
  });

  it('an empty name is refused with the field named', () => {
    expect(modelPaths({ subs: [{ ...subs[0], name: '  ' }, subs[1]] })).toEqual(['subs.0.name']);
  });
});

describe('seatBalanceMeasuredRequestSchema', () => {
  it('accepts one measurement per sub per seat and fills the defaults', () => {
    const r = seatBalanceMeasuredRequestSchema.parse(MEASURED);
    expect(r.band).toEqual({ startHz: 20, stopHz: 120 });
    expect(r.limits.maxOutputLossDb).toBe(3);
    expect(r.measurements).toHaveLength(4);
  });

  it.each<[string, string[], Record<string, unknown>]>([
    ['an unknown sub name', ['measurements.3.sub', 'measurements'], { measurements: [...MEASURED.measurements.slice(0, 3), { sub: 'Sub three', seat: 'Right chair', measurementId: ID(4) }] }],
    ['an unknown seat name', ['measurements.0.seat', 'measurements'], { measurements: [{ sub: 'Sub one', seat: 'Back chair', measurementId: ID(1) }, ...MEASURED.measurements.slice(1)] }],
    ['a missing sub × seat pair', ['measurements'], { measurements: MEASURED.measurements.slice(0, 3) }],
    ['a pair given twice', ['measurements.4'], { measurements: [...MEASURED.measurements, { sub: 'sub ONE', seat: 'left chair', measurementId: ID(5) }] }],
    ['a bad measurement id', ['measurements.0.measurementId'], { measurements: [{ ...MEASURED.measurements[0], measurementId: 'not-a-uuid' }, ...MEASURED.measurements.slice(1)] }],
    ['no measurements', ['measurements', 'measurements', 'measurements', 'measurements', 'measurements'], { measurements: [] }],
    ['fewer than 2 seats', ['seats'], { seats: [{ name: 'Left chair' }], measurements: MEASURED.measurements.filter((m) => m.seat === 'Left chair') }],
    ['present for one sub only', ['subs'], { subs: [{ name: 'Sub one', present: { delayMs: 1, gainDb: 0, invert: false } }, { name: 'Sub two' }] }],
  ])('refuses %s, naming %j', (_, expected, patch) => {
    expect(measuredPaths(patch).sort()).toEqual([...expected].sort());
  });
});
