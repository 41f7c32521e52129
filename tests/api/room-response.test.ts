import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/room-response/route';
import { logFrequencyGridHz, modalTransfer, roomModes } from '@/dsp';
import { assertInDelta } from '../helpers/assert-in-delta';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field
type Json = any;

async function call(body: unknown, headers: Record<string, string> = { 'content-type': 'application/json' }): Promise<{ status: number; body: Json }> {
  const res = await POST(new Request('http://x/api/v1/room-response', { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: await res.json() };
}

const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7, rt60S: 0.4, temperatureC: 20 };
const seats = [
  { name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 centre', xM: 2.45, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
];
const subs = [
  { name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3 },
  { name: 'Sub front right', xM: 4.6, yM: 0.3, zM: 0.3 },
];
const BODY = { room, seats, subs, grid: { startHz: 15, stopHz: 200, pointsPerOctave: 24 }, map: { indices: [1, 0, 0], zM: 1.1, columns: 10, rows: 16 }, quarterWave: [{ name: 'Sub front left', distanceM: 0.5 }] };
const pathsOf = (body: Json): string[] => body.error.issues.map((i: { path: string }) => i.path).sort();

describe('POST /api/v1/room-response — modal seat responses (published: Kuttruff, Room Acoustics, ch. 3)', () => {
  it('answers one summed curve and one curve per sub for each seat on the log grid, with the modes used up to 1.5 × stopHz', async () => {
    const { status, body } = await call(BODY);
    expect(status).toBe(200);
    expect(body.frequencyHz[0]).toBe(15);
    expect(body.seats).toHaveLength(3);
    for (const seat of body.seats) {
      expect(seat.summedDb).toHaveLength(body.frequencyHz.length);
      expect(seat.perSubDb).toHaveLength(2);
    }
    expect(body.maxModeHz).toBe(300);
    expect(body.modeCount).toBe(roomModes({ lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 300, temperatureC: 20 }).modes.length);
    assertInDelta(body.schroederHz, 137.5, 0.05, 'Schroeder (published: Schroeder 1996)');
  });

  it('relative levels: 0 dB is the power mean over the seats in the spread band, and the curves keep the modal sum’s shape', async () => {
    const { body } = await call({ ...BODY, subs: [subs[0]] });
    const f = body.frequencyHz as number[];
    // The answer's frequencies are rounded to 5 digits; compare on the exact grid.
    const exact = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 24 });
    const mlp = modalTransfer({ room, sourceM: { x: 0.3, y: 0.3, z: 0.3 }, receiverM: { x: 2.45, y: 3.7, z: 1.1 }, frequencyHz: exact, rt60S: 0.4, temperatureC: 20, maxModeHz: 300 });
    f.forEach((_, i) => assertInDelta(body.seats[1].summedDb[i], (mlp.magnitudeDb[i] as number) - body.referenceDb, 0.011, `MLP at ${f[i]} Hz`));
    const band = body.seats.flatMap((s: Json) => s.summedDb.filter((_: number, i: number) => f[i]! >= 20 && f[i]! <= 120));
    const meanPower = band.reduce((a: number, v: number) => a + 10 ** (v / 10), 0) / band.length;
    assertInDelta(10 * Math.log10(meanPower), 0, 0.02, 'power mean');
  });

  it('the summed curve adds the subs as complex pressures: inverting one sub changes the sum, not the per-sub curves', async () => {
    const plain = (await call(BODY)).body;
    const inverted = (await call({ ...BODY, subs: [subs[0], { ...subs[1], invert: true }] })).body;
    const shift = plain.referenceDb - inverted.referenceDb;
    plain.seats[1].perSubDb[1].forEach((v: number, i: number) => assertInDelta(inverted.seats[1].perSubDb[1][i] - shift, v, 0.02, `per-sub ${i}`));
    const differs = plain.seats[1].summedDb.some((v: number, i: number) => Math.abs(v - (inverted.seats[1].summedDb[i] - shift)) > 3);
    expect(differs).toBe(true);
  });

  it('seat-to-seat spread: max − min over the seats at each frequency, summarised over 20–120 Hz', async () => {
    const { body } = await call(BODY);
    const f = body.frequencyHz as number[];
    body.spread.spreadDb.forEach((s: number, i: number) => {
      const values = body.seats.map((seat: Json) => seat.summedDb[i]);
      assertInDelta(s, Math.max(...values) - Math.min(...values), 0.02, `spread at ${f[i]} Hz`);
    });
    expect(body.spread.maxSpreadHz).toBeGreaterThanOrEqual(20);
    expect(body.spread.maxSpreadHz).toBeLessThanOrEqual(120);
    expect(body.spread.maxSpreadDb).toBeGreaterThanOrEqual(body.spread.meanSpreadDb);
    expect((await call({ ...BODY, seats: [seats[1]] })).body.spread).toBeNull();
  });

  it('mode map: (1,0,0) is cos(πy/L) along the length, 26.81 Hz, zero at mid-room; quarter-wave notch 0.5 m → 171.6 Hz (published: Allison, JAES 22(5), 1974)', async () => {
    const { body } = await call(BODY);
    expect(body.map.kind).toBe('axial');
    assertInDelta(body.map.frequencyHz, 26.81, 0.005, 'mode frequency');
    // 16 rows asked for; 17 answered, the nearest count whose cell centres fall on the (1,0,0) node at L/2 (geometry).
    expect(body.map.rows).toBe(17);
    expect(body.map.pressure).toHaveLength(17);
    expect(body.map.pressure[0]).toHaveLength(10);
    body.map.yM.forEach((y: number, r: number) => assertInDelta(body.map.pressure[r][3], Math.cos((Math.PI * y) / 6.4), 0.002, `row ${r}`));
    expect(Math.abs(body.map.pressure[8][3])).toBe(0);
    // At each seat itself (y = 3.7 m): cos(π·3.7/6.4) = −0.243 (geometry), not the nearest cell's value.
    expect(body.map.seatPressure).toEqual([-0.243, -0.243, -0.243]);
    assertInDelta(body.quarterWave[0].notchHz, 171.6, 0.05, 'c/(4d)');
  });
});

describe('POST /api/v1/room-response — bad input answered with the field named', () => {
  it('a seat outside the room, a sub with a negative delay and no seats are refused by path', async () => {
    const a = await call({ ...BODY, seats: [{ ...seats[0], xM: 7 }], subs: [{ ...subs[0], delayMs: -2 }] });
    expect(a.status).toBe(400);
    expect(pathsOf(a.body)).toEqual(['seats.0.xM', 'subs.0.delayMs']);
    expect(pathsOf((await call({ ...BODY, seats: [] })).body)).toEqual(['seats']);
  });
  it('grid limits: stopHz above 500 Hz, stopHz below startHz, too many points', async () => {
    expect(pathsOf((await call({ ...BODY, grid: { startHz: 15, stopHz: 900, pointsPerOctave: 24 } })).body)).toEqual(['grid.stopHz']);
    expect(pathsOf((await call({ ...BODY, grid: { startHz: 100, stopHz: 50, pointsPerOctave: 24 } })).body)).toEqual(['grid.stopHz']);
    expect(pathsOf((await call({ ...BODY, grid: { startHz: 10, stopHz: 500, pointsPerOctave: 192 } })).body)).toEqual(['grid.pointsPerOctave']);
  });
  it('a big room whose modal sum would need more than 5000 modes is refused naming grid.stopHz', async () => {
    const big = await call({ ...BODY, room: { ...room, lengthM: 40, widthM: 30, heightM: 12 }, grid: { startHz: 15, stopHz: 300, pointsPerOctave: 12 } });
    expect(big.status).toBe(400);
    expect(pathsOf(big.body)).toEqual(['grid.stopHz']);
  });
  it('map indices (0,0,0), a fractional index and a map above the ceiling are refused', async () => {
    expect(pathsOf((await call({ ...BODY, map: { indices: [0, 0, 0], zM: 1.1 } })).body)).toEqual(['map.indices']);
    expect(pathsOf((await call({ ...BODY, map: { indices: [1.5, 0, 0], zM: 1.1 } })).body)).toEqual(['map.indices.0']);
    expect(pathsOf((await call({ ...BODY, map: { indices: [1, 0, 0], zM: 3.5 } })).body)).toEqual(['map.zM']);
  });
  it('a wrong type (invert as a string) and 9 subs are refused by path; 415 and 413 as the API page documents', async () => {
    expect(pathsOf((await call({ ...BODY, subs: [{ ...subs[0], invert: 'yes' }] })).body)).toEqual(['subs.0.invert']);
    expect(pathsOf((await call({ ...BODY, subs: Array.from({ length: 9 }, () => subs[0]) })).body)).toEqual(['subs']);
    expect((await call(JSON.stringify(BODY), { 'content-type': 'text/plain' })).status).toBe(415);
    expect((await call({ ...BODY, notes: 'x'.repeat(300 * 1024) })).status).toBe(413);
  });
});
