import { describe, expect, it } from 'vitest';
import { computeRoomResponse, roomResponseRequestFromDocument } from '@/lib/system-model/room-response';
import { roomResponseRequestSchema } from '@/lib/validations/compute-room';
import { testSystem, withSpeaker, withSub } from './test-system';

const C20 = 331.3 * Math.sqrt(1 + 20 / 273.15);
const sig = (v: number, digits: number) => Number(v.toPrecision(digits));

describe('roomResponseRequestFromDocument: every seat and sub as the document says', () => {
  it('seats, subs with gain + 20·log10(units), processor delay (distance alignment + own) and polarity; the front-wall distance of each sub and of L, C, R', () => {
    const doc = withSub(testSystem(), 1, { delayMs: 1.5, invert: true, gainDb: -2 });
    const req = roomResponseRequestFromDocument(doc)!;
    expect(req.room).toEqual(doc.room);
    expect(req.grid).toEqual({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
    expect(req.seats).toEqual([
      { name: 'Centre chair', xM: 3, yM: 5, zM: 1.2 },
      { name: 'Side chair', xM: 4, yM: 5, zM: 1.2 },
    ]);
    // By hand: Sub A is 4 m from the MLP, Sub B 5 m; the processor delays A by 1 m / 343.215 m/s = 2.91 ms (20 °C),
    // B has its own 1.5 ms: relative to the smaller, A 1.41 ms and B 0.
    expect(req.subs[0]).toEqual({ name: 'Sub A', xM: 3, yM: 1, zM: 1.2, gainDb: 20 * Math.log10(2), delayMs: 1.41, invert: false });
    expect(req.subs[1]).toEqual({ name: 'Sub B', xM: 0, yM: 1, zM: 1.2, gainDb: -2, delayMs: 0, invert: true });
    expect(req.spread).toEqual({ startHz: 20, stopHz: 120 });
    expect(req.map).toBeUndefined();
    expect(req.quarterWave).toEqual([
      { name: 'Sub A', distanceM: 1 },
      { name: 'Sub B', distanceM: 1 },
      { name: 'L', distanceM: 2.6 },
      { name: 'C', distanceM: 2 },
      { name: 'R', distanceM: 2.6 },
    ]);
    expect(roomResponseRequestSchema.safeParse(req).success).toBe(true);
  });

  it('a mode map at the MLP’s ear height when asked; a level held within ±30 dB; a source outside the room has no notch', () => {
    const doc = withSpeaker(withSub(testSystem(), 0, { gainDb: 28 }), 'C', { yM: -1 });
    const req = roomResponseRequestFromDocument(doc, { mapIndices: [1, 0, 0], startHz: 20, stopHz: 150, pointsPerOctave: 12 })!;
    expect(req.map).toEqual({ indices: [1, 0, 0], zM: 1.2, columns: 40, rows: 50 });
    expect(req.grid).toEqual({ startHz: 20, stopHz: 150, pointsPerOctave: 12 });
    expect(req.subs[0]!.gainDb).toBe(30);
    expect(req.quarterWave.map((q) => q.name)).toEqual(['Sub A', 'Sub B', 'L', 'R']);
  });

  it('no subs → null', () => {
    expect(roomResponseRequestFromDocument({ ...testSystem(), subs: [] })).toBeNull();
  });
});

describe('computeRoomResponse: the answer of POST /api/v1/room-response', () => {
  it('front-wall notches c/(4d); one seat is its own 0 dB reference; no spread with one seat', () => {
    const doc = { ...testSystem(), seats: [testSystem().seats[0]!] };
    const a = computeRoomResponse(roomResponseRequestSchema.parse(roomResponseRequestFromDocument(doc)));
    expect(a.speedOfSoundMps).toBe(sig(C20, 6));
    expect(a.quarterWave[0]).toEqual({ name: 'Sub A', distanceM: 1, notchHz: sig(C20 / 4, 5) });
    expect(a.quarterWave[3]).toEqual({ name: 'C', distanceM: 2, notchHz: sig(C20 / 8, 5) });
    expect(a.seats).toHaveLength(1);
    expect(a.seats[0]!.bandMeanDb).toBe(0);
    expect(a.seats[0]!.perSubDb).toHaveLength(2);
    expect(a.spread).toBeNull();
    expect(a.map).toBeNull();
    expect(a.subs).toEqual([{ name: 'Sub A' }, { name: 'Sub B' }]);
  });

  it('two seats: a spread over 20–120 Hz; a mode map of (1, 0, 0) at c/2L', () => {
    const a = computeRoomResponse(roomResponseRequestSchema.parse(roomResponseRequestFromDocument(testSystem(), { mapIndices: [1, 0, 0] })));
    expect(a.spread).toMatchObject({ startHz: 20, stopHz: 120 });
    // 50 rows asked for; 51, the nearest count with a cell centre on the node at L/2 (geometry).
    expect(a.map).toMatchObject({ indices: [1, 0, 0], kind: 'axial', frequencyHz: sig(C20 / 14, 6), columns: 40, rows: 51 });
    expect(a.map!.pressure).toHaveLength(51);
    expect(a.map!.pressure[25]!.every((p) => p === 0)).toBe(true);
    // Both seats at y = 5 m of a 7 m room: cos(5π/7) = −0.623 (geometry), read at the seat, not at a cell.
    expect(a.map!.seatPressure).toEqual([-0.623, -0.623]);
  });
});
