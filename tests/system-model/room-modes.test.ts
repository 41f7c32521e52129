import { describe, expect, it } from 'vitest';
import { applyRoomToDocument, computeRoomModes, roomModesRequestFromDocument } from '@/lib/system-model/room-modes';
import { roomModesRequestSchema } from '@/lib/validations/compute-room';
import { testSystem } from './test-system';

/** Speed of sound at 20 °C, m/s: 331.3·√(1 + 20/273.15) (Kinsler et al. 2000). */
const C20 = 331.3 * Math.sqrt(1 + 20 / 273.15);
const sig = (v: number, digits: number) => Number(v.toPrecision(digits));

describe('roomModesRequestFromDocument: the room as the document says', () => {
  it('7 × 6 × 3 m, RT60 0.4 s, 20 °C, modes to 200 Hz unless asked', () => {
    expect(roomModesRequestFromDocument(testSystem())).toEqual({ lengthM: 7, widthM: 6, heightM: 3, maxHz: 200, temperatureC: 20, rt60S: 0.4 });
    expect(roomModesRequestFromDocument(testSystem(), 120).maxHz).toBe(120);
  });
});

describe('computeRoomModes: the answer of POST /api/v1/room-modes', () => {
  const answer = () => computeRoomModes(roomModesRequestSchema.parse(roomModesRequestFromDocument(testSystem())));

  it('the first axial modes are c/2L, c/2W and c/2H (6 significant digits); the volume 126 m³', () => {
    const a = answer();
    expect(a.volumeM3).toBe(126);
    expect(a.speedOfSoundMps).toBe(sig(C20, 6));
    const axial = (indices: [number, number, number]) => a.modes.find((m) => m.indices.join() === indices.join());
    expect(axial([1, 0, 0])).toEqual({ frequencyHz: sig(C20 / 14, 6), indices: [1, 0, 0], kind: 'axial' });
    expect(axial([0, 1, 0])!.frequencyHz).toBe(sig(C20 / 12, 6));
    expect(axial([0, 0, 1])!.frequencyHz).toBe(sig(C20 / 6, 6));
    expect(a.modes[0]!.indices).toEqual([1, 0, 0]); // the lowest
  });

  it('Schroeder frequency 2000·√(RT60 / V) (Schroeder 1962) to 5 digits; the kind counts add up to the modes listed', () => {
    const a = answer();
    expect(a.schroederHz).toBe(sig(2000 * Math.sqrt(0.4 / 126), 5));
    expect(a.kindCounts.axial + a.kindCounts.tangential + a.kindCounts.oblique).toBe(a.modes.length);
    expect(a.statisticalCount.enumerated).toBe(a.modes.length);
  });
});

describe('applyRoomToDocument: a change of the room, nothing moved', () => {
  it('the room takes the patch; every seat, speaker and sub stays where it was; what no longer fits is named', () => {
    const doc = testSystem();
    const { doc: next, outside } = applyRoomToDocument(doc, { lengthM: 4.5 });
    expect(next.room).toEqual({ ...doc.room, lengthM: 4.5 });
    expect({ ...next, room: doc.room }).toEqual(doc);
    // Both chairs are at y = 5 m: beyond a 4.5 m long room.
    expect(outside.map((o) => o.path)).toEqual(['seats.0.yM', 'seats.1.yM']);
    expect(doc.room.lengthM).toBe(7); // not mutated
  });
});
