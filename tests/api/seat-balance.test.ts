/**
 * POST /api/v1/seat-balance against the running app: the documented shape, refusals by field path, the compute
 * routes' 413/415, and the measured variant (session, phase, workspace rights). The judge of the numbers is the app's
 * own POST /api/v1/room-response fed the answer's settings (issue 15: the same meanSpreadDb within 0.01 dB).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { logFrequencyGridHz, modalTransfers } from '@/dsp';
import { issuePaths, type Json } from '../helpers/compute-route';
import { Client, signedInClient } from '../helpers/http';

// The invented Juniper Lane room of the demo (fictional), its two subs and three seats.
const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7, rt60S: 0.4, temperatureC: 20 };
const seats = [
  { name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 centre', xM: 2.45, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
];
const subs = [
  { name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3 },
  { name: 'Sub right wall', xM: 4.6, yM: 2.8, zM: 0.3 },
];
const BODY = { room, seats, subs };
const ROUNDED = 0.0101;

const anonymous = new Client();
const post = (body: unknown, client: Client = anonymous, headers?: Record<string, string>) => client.post('/api/v1/seat-balance', body, headers);

/** room-response's mean spread (the app's own route) for the room and seats with `withSettings` subs. */
async function roomResponseSpreadDb(seatList: typeof seats, withSettings: Json[], grid: Json): Promise<number> {
  const r = await anonymous.post('/api/v1/room-response', { room, grid, seats: seatList, subs: withSettings, spread: { startHz: 20, stopHz: 120 } });
  expect(r.status, r.text).toBe(200);
  return r.body.spread.meanSpreadDb;
}

describe('POST /api/v1/seat-balance — the modal model', () => {
  it('200 with the documented shape; the settings posted to room-response give after.meanSpreadDb', async () => {
    const r = await post(BODY);
    expect(r.status, r.text).toBe(200);
    const a = r.body;
    expect(a.source).toBe('model');
    expect(typeof a.objective).toBe('string');
    expect(a.band).toEqual({ startHz: 20, stopHz: 120 });
    expect(a.grid).toEqual({ startHz: 20, stopHz: 120, pointsPerOctave: 48 });
    expect(a.limits).toEqual({ maxDelayMs: 20, minGainDb: -12, maxGainDb: 6, allowInvert: true, maxOutputLossDb: 3 });
    expect(a.subs.map((s: Json) => s.name)).toEqual(subs.map((s) => s.name));
    for (const s of a.subs) expect(Object.keys(s).sort()).toEqual(['delayMs', 'gainDb', 'invert', 'name', 'xM', 'yM', 'zM']);
    for (const m of [a.before, a.after]) expect(Object.keys(m).sort()).toEqual(['maxSpreadDb', 'maxSpreadHz', 'meanLevelDb', 'meanSpreadDb']);
    expect(a.before.meanLevelDb).toBe(0);
    expect(a.after.meanSpreadDb).toBeLessThanOrEqual(a.before.meanSpreadDb);
    expect(a.after.meanLevelDb).toBeGreaterThanOrEqual(-3);
    expect(a.evaluated).toBeGreaterThan(0);
    expect(a.seats).toHaveLength(3);
    for (const seat of a.seats) expect(seat.afterDb).toHaveLength(a.frequencyHz.length);
    expect(a.spread.afterDb).toHaveLength(a.frequencyHz.length);
    expect(a.present).toBeUndefined();
    expect(a.placements).toBeUndefined();
    const grid = { startHz: 20, stopHz: 120, pointsPerOctave: 48 };
    const after = await roomResponseSpreadDb(seats, a.subs, grid);
    const before = await roomResponseSpreadDb(seats, subs, grid);
    expect(Math.abs(after - a.after.meanSpreadDb)).toBeLessThanOrEqual(ROUNDED);
    expect(Math.abs(before - a.before.meanSpreadDb)).toBeLessThanOrEqual(ROUNDED);
    // The same request and seed, the same answer.
    expect((await post(BODY)).body.subs).toEqual(a.subs);
  });

  it.each<[string, string, Json]>([
    ['one seat', 'seats', { ...BODY, seats: [seats[0]] }],
    ['a seat outside the room', 'seats.2.xM', { ...BODY, seats: [seats[0], seats[1], { ...seats[2], xM: 5.2 }] }],
    ['a sub above the ceiling', 'subs.1.zM', { ...BODY, subs: [subs[0], { ...subs[1], zM: 3 }] }],
    ['nine subs', 'subs', { ...BODY, subs: Array.from({ length: 9 }, (_, i) => ({ ...subs[0], name: `Sub ${i}` })) }],
    ['two seats of one name', 'seats.1.name', { ...BODY, seats: [seats[0], { ...seats[1], name: 'row 1 LEFT' }] }],
    ['stopHz below startHz', 'band.stopHz', { ...BODY, band: { startHz: 100, stopHz: 50 } }],
    ['the band outside the grid', 'band', { ...BODY, grid: { startHz: 40, stopHz: 200, pointsPerOctave: 24 } }],
    ['a delay limit of 80 ms', 'limits.maxDelayMs', { ...BODY, limits: { maxDelayMs: 80 } }],
    ['a placement of 9 subs', 'placement.count', { ...BODY, placement: { count: 9 } }],
    ['invert as text in the limits', 'limits.allowInvert', { ...BODY, limits: { allowInvert: 'no' } }],
  ])('400 for %s, naming %s', async (_, where, body) => {
    const r = await post(body);
    expect(r.status).toBe(400);
    expect(issuePaths(r.body)).toContain(where);
  });

  it('415 for another media type, 413 over 256 KB, 400 for broken JSON', async () => {
    expect((await post(JSON.stringify(BODY), anonymous, { 'Content-Type': 'text/plain' })).status).toBe(415);
    expect((await post({ ...BODY, notes: 'x'.repeat(300 * 1024) })).status).toBe(413);
    const broken = await post('{"room":', anonymous, { 'Content-Type': 'application/json' });
    expect(broken.status).toBe(400);
    expect(issuePaths(broken.body)).toEqual(['(body)']);
  });
});

// Invented sub-at-seat "measurements": the modal model's response of each sub at two of the seats, with its phase.
const GRID = { startHz: 15, stopHz: 200, pointsPerOctave: 48 };
const f = logFrequencyGridHz(GRID);
const twoSeats = seats.slice(0, 2);
const model = modalTransfers({ room, sourcesM: subs.map((s) => ({ x: s.xM, y: s.yM, z: s.zM })), receiversM: twoSeats.map((s) => ({ x: s.xM, y: s.yM, z: s.zM })), frequencyHz: f, rt60S: room.rt60S, temperatureC: room.temperatureC, maxModeHz: 300 });
function curveText(s: number, k: number, withPhase = true): string {
  const c = model.transfers[s]![k]!;
  const lines = ['# invented sub-at-seat curve (modal model)', withPhase ? 'Frequency (Hz),Magnitude (dB),Phase (deg)' : 'Frequency (Hz),Magnitude (dB)'];
  f.forEach((hz, i) => lines.push(withPhase ? `${hz},${c.magnitudeDb[i]},${(Math.atan2(c.im[i]!, c.re[i]!) * 180) / Math.PI}` : `${hz},${c.magnitudeDb[i]}`));
  return lines.join('\n');
}
function form(text: string, name: string): FormData {
  const fd = new FormData();
  fd.set('file', new Blob([text], { type: 'text/csv' }), `${name}.csv`);
  fd.set('name', `${name} (invented)`);
  fd.set('role', 'sub');
  return fd;
}

describe('POST /api/v1/seat-balance — stored measurements', () => {
  let owner: Client;
  let other: Client;
  const made: { client: Client; id: string }[] = [];
  const ids: Record<string, string> = {};
  const measuredBody = (patch: Record<string, string> = {}) => ({
    seats: twoSeats.map((s) => ({ name: s.name })),
    subs: subs.map((s) => ({ name: s.name })),
    grid: GRID,
    measurements: subs.flatMap((sub, s) => twoSeats.map((seat, k) => ({ sub: sub.name, seat: seat.name, measurementId: patch[`${s}-${k}`] ?? ids[`${s}-${k}`]! }))),
  });

  beforeAll(async () => {
    [owner, other] = await Promise.all([signedInClient('demo@seamline.test'), signedInClient('other@seamline.test')]);
    const upload = async (client: Client, text: string, name: string) => {
      const r = await client.post('/api/v1/measurements', form(text, name));
      if (r.status !== 201) throw new Error(`upload ${name}: ${r.status} ${r.text}`);
      made.push({ client, id: r.body.id });
      return r.body.id as string;
    };
    for (let s = 0; s < 2; s++) for (let k = 0; k < 2; k++) ids[`${s}-${k}`] = await upload(owner, curveText(s, k), `seat-balance-test-sub${s + 1}-seat${k + 1}`);
    ids.noPhase = await upload(owner, curveText(1, 0, false), 'seat-balance-test-no-phase');
    ids.others = await upload(other, curveText(0, 1), 'seat-balance-test-other-workspace');
  }, 60_000);

  afterAll(async () => {
    for (const { client, id } of made) await client.delete(`/api/v1/measurements/${id}`);
  });

  it('401 without a session', async () => {
    const r = await post(measuredBody());
    expect(r.status).toBe(401);
  });

  it('with a session: 200, source measured; the settings posted to room-response for the same room give after.meanSpreadDb', async () => {
    const r = await post(measuredBody(), owner);
    expect(r.status, r.text).toBe(200);
    expect(r.body.source).toBe('measured');
    expect(r.body.subs.map((s: Json) => s.name)).toEqual(subs.map((s) => s.name));
    expect(r.body.after.meanSpreadDb).toBeLessThanOrEqual(r.body.before.meanSpreadDb);
    const withSettings = subs.map((s, i) => ({ ...s, delayMs: r.body.subs[i].delayMs, gainDb: r.body.subs[i].gainDb, invert: r.body.subs[i].invert }));
    expect(Math.abs((await roomResponseSpreadDb(twoSeats, withSettings, GRID)) - r.body.after.meanSpreadDb)).toBeLessThanOrEqual(ROUNDED);
    expect(Math.abs((await roomResponseSpreadDb(twoSeats, subs, GRID)) - r.body.before.meanSpreadDb)).toBeLessThanOrEqual(ROUNDED);
  });

  it('a file without phase is refused with 400 naming measurements.N.measurementId', async () => {
    const r = await post(measuredBody({ '1-0': ids.noPhase! }), owner);
    expect(r.status).toBe(400);
    expect(issuePaths(r.body)).toEqual(['measurements.2.measurementId']);
    expect(r.body.error.message).toMatch(/phase/);
  });

  it('another workspace’s measurement is 404, an unknown id too', async () => {
    expect((await post(measuredBody({ '0-1': ids.others! }), owner)).status).toBe(404);
    expect((await post(measuredBody({ '0-1': '00000000-0000-4000-8000-00000000dead' }), owner)).status).toBe(404);
  });

  it('a missing pair is a 400 before any file is read', async () => {
    const body = measuredBody();
    const r = await post({ ...body, measurements: body.measurements.slice(1) }, owner);
    expect(r.status).toBe(400);
    expect(issuePaths(r.body)).toContain('measurements');
  });
});
