/**
 * POST /api/v1/eq-design. The inline curve and the modal model are called in-process (the route handler with a Request,
 * no sign-in); the stored-measurement form runs against the app (`npm test`'s server and database), as it reads files
 * with the caller's workspace rights. The judge of the numbers is the cookbook filter evaluated with complex.js and the
 * residual from its definition (tests/dsp/eq/eq-oracle.ts), applied to what the answer returns.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/eq-design/route';
import { eqDesignModelCurve } from '@/lib/system-model/eq-design';
import { eqDesignModelRequestSchema } from '@/lib/validations/compute-eq-design';
import { issuePaths, postTo, refusedNaming, type Json } from '../helpers/compute-route';
import { Client, signedInClient } from '../helpers/http';
import { cascadeDb, residualOf } from '../dsp/eq/eq-oracle';

const post = postTo(POST, '/api/v1/eq-design');

// Invented: the demo's 6.4 × 4.9 × 2.7 m Juniper Lane room (fictional), two front-corner subs, three seats; a made-up curve.
const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7, rt60S: 0.4, temperatureC: 20 };
const seats = [
  { name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 centre', xM: 2.45, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
];
const subs = [
  { name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3, rolloffs: [{ kind: 'vented', cornerHz: 22 }] },
  { name: 'Sub front right', xM: 4.6, yM: 0.3, zM: 0.3, rolloffs: [{ kind: 'vented', cornerHz: 22 }], delayMs: 0.5 },
];
const lowpass = { family: 'linkwitz-riley', order: 4, cornerHz: 80 };
const MODEL = { room, seats, subs, lowpass, at: 'Row 1 centre' };
const CURVE_HZ = Array.from({ length: 97 }, (_, i) => 15 * Math.pow(2, i / 24));
const CURVE = { frequencyHz: CURVE_HZ, magnitudeDb: cascadeDb([{ centerHz: 44, gainDb: 9, q: 4 }, { centerHz: 90, gainDb: -5, q: 2 }], 48000, CURVE_HZ) };

/** The answer's residual, recomputed from its own curves and filters by the oracle. */
function recheck(a: Json) {
  const eq = cascadeDb(a.filters, a.sampleRateHz, a.frequencyHz);
  const corrected = a.inputDb.map((v: number, i: number) => v + eq[i]!);
  const before = residualOf(a.frequencyHz, a.inputDb, a.targetDb, a.band, a.nulls);
  const after = residualOf(a.frequencyHz, corrected, a.targetDb, a.band, a.nulls);
  // The curves are rounded to 0.01 dB in the answer.
  expect(Math.abs(before.rmsDb - a.residual.before.rmsDb)).toBeLessThan(0.011);
  expect(Math.abs(after.rmsDb - a.residual.after.rmsDb)).toBeLessThan(0.011);
  eq.forEach((v, i) => expect(Math.abs(v - a.eqDb[i])).toBeLessThanOrEqual(0.0051));
}

describe('POST /api/v1/eq-design — an inline curve', () => {
  it('200 with the documented fields; the filters undo the curve and the residual is what the oracle finds', async () => {
    const { status, body } = await post(CURVE);
    expect(status).toBe(200);
    expect(Object.keys(body).sort()).toEqual(['band', 'caution', 'correctedDb', 'eqDb', 'filters', 'frequencyHz', 'input', 'inputDb', 'levelOffsetDb', 'nulls', 'residual', 'sampleRateHz', 'sections', 'seats', 'source', 'target', 'targetDb'].sort());
    expect(body).toMatchObject({ source: 'curve', input: 'the curve given', seats: [], band: { startHz: 20, stopHz: 120 }, target: { kind: 'flat' }, sampleRateHz: 48000 });
    expect(body.caution).toMatch(/Headroom tab/);
    expect(body.frequencyHz).toHaveLength(CURVE_HZ.length);
    expect(body.filters.length).toBeGreaterThan(0);
    expect(body.filters.length).toBeLessThanOrEqual(5);
    for (const f of body.filters) expect(f.gainDb).toBeLessThanOrEqual(3);
    expect(body.residual.after.rmsDb).toBeLessThan(body.residual.before.rmsDb);
    expect(body.residual.after.rmsDb).toBeLessThan(1);
    recheck(body);
    // Sections in the one convention, stable (|a2| < 1, |a1| < 1 + a2: Oppenheim and Schafer), one per filter.
    expect(body.sections).toHaveLength(body.filters.length);
    for (const s of body.sections) expect(Math.abs(s.a2) < 1 && Math.abs(s.a1) < 1 + s.a2).toBe(true);
  });

  it('the designer’s options are honoured: 2 filters at most, cuts only, 96 kHz, a house curve', async () => {
    const { status, body } = await post({ ...CURVE, maxFilters: 2, maxBoostDb: 0, sampleRateHz: 96000, target: { kind: 'house', riseDb: 3, belowHz: 40 } });
    expect(status).toBe(200);
    expect(body.filters.length).toBeLessThanOrEqual(2);
    for (const f of body.filters) expect(f.gainDb).toBeLessThan(0);
    expect(body.sampleRateHz).toBe(96000);
    recheck(body);
  });

  it('a flat curve: no filters', async () => {
    const { status, body } = await post({ frequencyHz: CURVE_HZ, magnitudeDb: CURVE_HZ.map(() => 71) });
    expect(status).toBe(200);
    expect(body.filters).toEqual([]);
    expect(body.sections).toEqual([]);
    expect(body.levelOffsetDb).toBe(71);
  });
});

describe('POST /api/v1/eq-design — the modal model', () => {
  it('at a seat: the model’s curve at that seat, relative to the target’s level; the same request gives the same answer', async () => {
    const { status, body } = await post(MODEL);
    expect(status).toBe(200);
    expect(body).toMatchObject({ source: 'model', input: 'model at Row 1 centre', seats: ['Row 1 centre'] });
    const curve = eqDesignModelCurve(eqDesignModelRequestSchema.parse(MODEL));
    body.inputDb.forEach((v: number, i: number) => expect(Math.abs(v - (curve.magnitudeDb[i]! - body.levelOffsetDb))).toBeLessThanOrEqual(0.011));
    recheck(body);
    expect(body.residual.after.rmsDb).toBeLessThan(body.residual.before.rmsDb);
    expect((await post(MODEL)).body).toEqual(body);
  });

  it('the power average over the seats by default', async () => {
    const { status, body } = await post({ ...MODEL, at: undefined });
    expect(status).toBe(200);
    expect(body.input).toBe('model, power average of 3 seats');
    expect(body.seats).toEqual(seats.map((s) => s.name));
  });

  it.each<[string, string, Json]>([
    ['a boost limit of 20 dB', 'maxBoostDb', { ...MODEL, maxBoostDb: 20 }],
    ['a seat that is not there', 'at', { ...MODEL, at: 'Row 2' }],
    ['a sub outside the room', 'subs.1.yM', { ...MODEL, subs: [subs[0], { ...subs[1], yM: 7 }] }],
    ['11 filters', 'maxFilters', { ...MODEL, maxFilters: 11 }],
    ['a band outside the grid', 'band', { ...MODEL, band: { startHz: 12, stopHz: 120 } }],
    ['a curve with one magnitude missing', 'magnitudeDb', { ...CURVE, magnitudeDb: CURVE.magnitudeDb.slice(1) }],
    ['a curve reaching the Nyquist frequency', 'frequencyHz.2', { frequencyHz: [20, 60, 4000], magnitudeDb: [0, 0, 0], sampleRateHz: 8000, band: { startHz: 20, stopHz: 4000 } }],
  ])('400 for %s, naming %s', refusedNaming(post));

  it('415 for another media type, 413 over 256 KB, 400 for broken JSON', async () => {
    expect((await post(JSON.stringify(MODEL), { 'content-type': 'text/plain' })).status).toBe(415);
    expect((await post({ ...MODEL, notes: 'x'.repeat(300 * 1024) })).status).toBe(413);
    const broken = await post('{"room":');
    expect(broken.status).toBe(400);
    expect(issuePaths(broken.body)).toEqual(['(body)']);
  });
});

// Invented "all subs" files: the model's response at two seats through the processor, magnitude only (no phase).
const twoSeats = seats.slice(0, 2);
function curveText(seat: string, withPhase: boolean): string {
  const c = eqDesignModelCurve(eqDesignModelRequestSchema.parse({ ...MODEL, at: seat }));
  const lines = ['# invented curve (modal model, every sub playing)', withPhase ? 'Frequency (Hz),Magnitude (dB),Phase (deg)' : 'Frequency (Hz),Magnitude (dB)'];
  c.frequencyHz.forEach((hz, i) => lines.push(withPhase ? `${hz},${c.magnitudeDb[i]},0` : `${hz},${c.magnitudeDb[i]}`));
  return lines.join('\n');
}
function form(text: string, name: string, seat: string, role: string): FormData {
  const fd = new FormData();
  fd.set('file', new Blob([text], { type: 'text/csv' }), `${name}.csv`);
  fd.set('name', `${name} (invented)`);
  fd.set('seat', seat);
  fd.set('role', role);
  return fd;
}

describe('POST /api/v1/eq-design — stored measurements (against the running app)', () => {
  let owner: Client;
  let other: Client;
  const made: { client: Client; id: string }[] = [];
  const ids: Record<string, string> = {};
  const app = new Client();

  beforeAll(async () => {
    [owner, other] = await Promise.all([signedInClient('demo@seamline.test'), signedInClient('other@seamline.test')]);
    const upload = async (client: Client, text: string, name: string, seat: string, role: string) => {
      const r = await client.post('/api/v1/measurements', form(text, name, seat, role));
      if (r.status !== 201) throw new Error(`upload ${name}: ${r.status} ${r.text}`);
      made.push({ client, id: r.body.id });
      return r.body.id as string;
    };
    for (const [k, seat] of twoSeats.entries()) ids[`all-${k}`] = await upload(owner, curveText(seat.name, false), `eq-design-test-all-${k}`, seat.name, 'all subs');
    ids.noPhase = await upload(owner, curveText(seats[0]!.name, false), 'eq-design-test-sub-no-phase', seats[0]!.name, subs[0]!.name);
    ids.others = await upload(other, curveText(seats[0]!.name, false), 'eq-design-test-other-workspace', seats[0]!.name, 'all subs');
  }, 60_000);

  afterAll(async () => {
    for (const { client, id } of made) await client.delete(`/api/v1/measurements/${id}`);
  });

  const together = (patch: Record<string, string> = {}) => ({ measurements: twoSeats.map((s, k) => ({ seat: s.name, measurementId: patch[`all-${k}`] ?? ids[`all-${k}`]! })), lowpass });

  it('401 without a session', async () => {
    expect((await app.post('/api/v1/eq-design', together())).status).toBe(401);
  });

  it('with a session: every sub together at two seats, power-averaged; the model’s answer for the same seats', async () => {
    const r = await owner.post('/api/v1/eq-design', together());
    expect(r.status, r.text).toBe(200);
    expect(r.body).toMatchObject({ source: 'measured', input: 'measured, power average of 2 seats (every sub playing together)', seats: twoSeats.map((s) => s.name) });
    const model = await app.post('/api/v1/eq-design', { ...MODEL, seats: twoSeats, at: 'average' });
    expect(r.body.filters).toEqual(model.body.filters);
    recheck(r.body);
  });

  it('files of each sub without phase for two subs are refused with 400 naming measurements.N.measurementId', async () => {
    const body = { subs: subs.map((s) => ({ name: s.name })), lowpass, measurements: subs.map((s) => ({ seat: seats[0]!.name, sub: s.name, measurementId: ids.noPhase! })) };
    const r = await owner.post('/api/v1/eq-design', body);
    expect(r.status).toBe(400);
    expect(issuePaths(r.body)).toEqual(['measurements.0.measurementId']);
    expect(r.body.error.message).toMatch(/phase/);
  });

  it('another workspace’s measurement is 404, an unknown id too', async () => {
    expect((await owner.post('/api/v1/eq-design', together({ 'all-1': ids.others! }))).status).toBe(404);
    expect((await owner.post('/api/v1/eq-design', together({ 'all-1': '00000000-0000-4000-8000-00000000dead' }))).status).toBe(404);
  });
});
