import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/layout/route';
import { assertInDelta } from '../helpers/assert-in-delta';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field
type Json = any;

async function call(body: unknown, headers: Record<string, string> = { 'content-type': 'application/json' }): Promise<{ status: number; body: Json }> {
  const res = await POST(new Request('http://x/api/v1/layout', { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: await res.json() };
}

// Listener at (2.45, 3.7, 1.1); speakers placed on a 2.5 m circle at the ITU-R BS.775-3 angles, at ear height.
const listener = { xM: 2.45, yM: 3.7, zM: 1.1 };
const at = (azimuthDeg: number, radiusM = 2.5, zM = 1.1) => {
  const a = (azimuthDeg * Math.PI) / 180;
  return { xM: listener.xM - radiusM * Math.sin(a), yM: listener.yM - radiusM * Math.cos(a), zM };
};
const ITU_51 = [
  { channel: 'L', ...at(30) },
  { channel: 'C', ...at(0) },
  { channel: 'R', ...at(-30) },
  { channel: 'SL', ...at(110) },
  { channel: 'SR', ...at(-110) },
];
const BODY = { template: '5.1', temperatureC: 20, room: { lengthM: 6.4, widthM: 4.9, heightM: 2.7 }, listener, speakers: ITU_51 };
const pathsOf = (body: Json): string[] => body.error.issues.map((i: { path: string }) => i.path).sort();

describe('POST /api/v1/layout — angles from the MLP (published: ITU-R BS.775-3, 2012)', () => {
  it('a 5.1 on a circle at 0°, ±30°, ±110° passes everywhere; azimuth positive to the left', async () => {
    const { status, body } = await call(BODY);
    expect(status).toBe(200);
    const byChannel = Object.fromEntries(body.speakers.map((s: Json) => [s.channel, s]));
    assertInDelta(byChannel.L.azimuthDeg, 30, 0.01, 'L');
    assertInDelta(byChannel.R.azimuthDeg, -30, 0.01, 'R');
    assertInDelta(byChannel.SL.azimuthDeg, 110, 0.01, 'SL');
    assertInDelta(byChannel.C.elevationDeg, 0, 0.01, 'C elevation');
    expect(body.speakers.map((s: Json) => s.status)).toEqual(['pass', 'pass', 'pass', 'pass', 'pass']);
    expect(body.missingChannels).toEqual([]);
    expect(byChannel.L.recommended.source).toMatch(/BS\.775-3/);
  });

  it('front pair at ±30° has a 60° included angle (geometry: equilateral triangle) and passes', async () => {
    const { body } = await call(BODY);
    assertInDelta(body.frontPair.includedAngleDeg, 60, 0.01, 'included angle');
    expect(body.frontPair.status).toBe('pass');
    expect(body.frontPair.recommended).toEqual({ nominal: 60, min: 44, max: 60 });
  });

  it('warns for a surround at 80° and for a left speaker on the right, saying why', async () => {
    const { body } = await call({ ...BODY, speakers: [{ channel: 'L', ...at(-20) }, ITU_51[1], ITU_51[2], { channel: 'SL', ...at(80, 2.2) }, ITU_51[4]] });
    const sl = body.speakers.find((s: Json) => s.channel === 'SL');
    expect(sl.status).toBe('warn');
    assertInDelta(sl.azimuthOffDeg, 20, 0.01, 'SL below 100°');
    expect(sl.message).toMatch(/below 100°/);
    const l = body.speakers.find((s: Json) => s.channel === 'L');
    expect(l.wrongSide).toBe(true);
    expect(l.status).toBe('warn');
  });

  it('toe-in: a front speaker square to the front wall turns by its azimuth to face the MLP; aiming at another seat changes it', async () => {
    const { body } = await call({ ...BODY, seats: [{ id: 'left', name: 'Left seat', xM: 1.75, yM: 3.7, zM: 1.1 }], speakers: [{ ...ITU_51[0], aim: { kind: 'mlp' } }, { ...ITU_51[2], aim: { kind: 'seat', seatId: 'left' } }] });
    const [l, r] = body.speakers;
    assertInDelta(l.toeInDeg, 30, 0.05, 'L toe-in = azimuth (geometry)');
    expect(l.facingDeg).toBe(0);
    // A side surround starts square to the side wall (facing +x from the left wall).
    const sl = (await call(BODY)).body.speakers.find((s: Json) => s.channel === 'SL');
    expect(sl.facingDeg).toBe(90);
    assertInDelta(sl.toeInDeg, 20, 0.05, 'SL at 110° turns 20° back toward the MLP');
    // R aimed at the left seat 0.7 m further left: atan((1.25 + 0.7) / 2.165) = 42.0°.
    assertInDelta(r.toeInDeg, (Math.atan(1.95 / (2.5 * Math.cos(Math.PI / 6))) * 180) / Math.PI, 0.05, 'R toward the left seat');
  });

  it('delays and trims relative to the farthest: 1 m nearer is 2.914 ms at 20 °C and −20·log10(d/dmax) dB (published: Kinsler et al. 2000; inverse-square law)', async () => {
    const { body } = await call({ ...BODY, speakers: [{ channel: 'L', ...at(30, 3) }, { channel: 'C', ...at(0, 2) }, { channel: 'R', ...at(-30, 3) }], subs: [{ name: 'Sub', ...at(40, 3.5, 0.3) }] });
    const c = body.speakers.find((s: Json) => s.channel === 'C');
    const l = body.speakers.find((s: Json) => s.channel === 'L');
    expect(body.farthest).toEqual({ name: 'Sub', distanceM: 3.59 });
    const subDistance = Math.hypot(3.5, 0.8);
    // Processor settings, rounded once: 0.01 ms and 0.1 dB (the Settings sheet's numbers).
    assertInDelta(l.delayMs, ((subDistance - 3) / 343.2146) * 1000, 0.005 + 1e-9, 'L waits for the sub');
    expect(l.delayMs).toBe(1.72); // 0.5903 m × 2.9136 ms/m = 1.7199
    expect(c.delayMs).toBe(4.63); // 1.5903 m × 2.9136 ms/m = 4.6335
    assertInDelta(c.delayMs - l.delayMs, 2.914, 0.01, '1 m = 2.914 ms');
    expect(c.trimDb).toBe(-3.5); // 20·log10(2/3) = −3.52, among the speakers
    expect(l.trimDb).toBe(0);
    expect(body.subs[0]).toEqual({ name: 'Sub', distanceM: 3.59, distanceSource: 'geometry', delayMs: 0, gainDb: 0 });
  });

  it('the mains delay, each speaker’s offset and each sub’s own delay and gain join in: the channel settings of the Settings sheet', async () => {
    const { body } = await call({
      ...BODY,
      mainsDelayMs: 1.5,
      speakers: [{ channel: 'L', ...at(30, 3) }, { channel: 'C', ...at(0, 2), trimDb: 0.5 }, { channel: 'R', ...at(-30, 3) }],
      subs: [{ name: 'Sub', ...at(40, 3.5, 0.3), delayMs: 2, gainDb: -3 }],
    });
    // Totals: L and R 1.72 + 1.5 = 3.22, C 4.63 + 1.5 = 6.13, sub 0 + 2 = 2; the shared 2 ms taken out.
    expect(body.speakers.map((s: Json) => [s.channel, s.delayMs, s.trimDb])).toEqual([
      ['L', 1.22, 0],
      ['C', 4.13, -3], // −3.52 + 0.5 = −3.02
      ['R', 1.22, 0],
    ]);
    expect(body.subs[0]).toMatchObject({ delayMs: 0, gainDb: -3 });
    // Left out, they are 0: five speakers on one circle, no subs, all 0 ms and 0 dB.
    const plain = await call(BODY);
    expect(plain.body.speakers.map((s: Json) => [s.delayMs, s.trimDb])).toEqual(Array.from({ length: 5 }, () => [0, 0]));
  });

  it('a distance override replaces the geometry for delay; radiusM returns the template’s nominal positions kept inside the room', async () => {
    const { body } = await call({ ...BODY, speakers: [{ ...ITU_51[0], distanceOverrideM: 4 }, ITU_51[1]], radiusM: 3 });
    expect(body.speakers[0].distanceM).toBe(4);
    assertInDelta(body.speakers[0].geometricDistanceM, 2.5, 0.001, 'geometry kept');
    expect(body.nominalPositions.map((n: Json) => n.channel)).toEqual(['L', 'C', 'R', 'SL', 'SR']);
    const sl = body.nominalPositions.find((n: Json) => n.channel === 'SL');
    expect(sl.clamped).toBe(true);
    expect(sl.xM).toBeGreaterThanOrEqual(0.15 - 1e-9);
  });

  it('channels outside the template are reported as unlisted, missing ones listed', async () => {
    const { body } = await call({ ...BODY, template: '7.1', speakers: [...ITU_51, { channel: 'TFC', ...at(0, 2, 2.6) }] });
    expect(body.speakers.find((s: Json) => s.channel === 'TFC').status).toBe('unlisted');
    expect(body.missingChannels).toEqual(['SBL', 'SBR']);
  });
});

describe('POST /api/v1/layout — bad input answered with the field named', () => {
  it('unknown template, missing listener, no speakers', async () => {
    const { status, body } = await call({ temperatureC: 20, template: '6.2', speakers: [] });
    expect(status).toBe(400);
    expect(pathsOf(body)).toEqual(['listener', 'speakers', 'template']);
    expect(body.error.issues.find((i: Json) => i.path === 'template').message).toMatch(/one of 2\.0/);
  });
  it('a speaker outside the room, at the listener, an aim at an unknown seat and a bad aim kind', async () => {
    const { body } = await call({ ...BODY, speakers: [{ channel: 'L', xM: 5.5, yM: 1, zM: 1 }, { channel: 'C', ...listener }, { channel: 'R', ...at(-30), aim: { kind: 'seat', seatId: 'nobody' } }, { channel: 'SL', ...at(110), aim: { kind: 'wall' } }] });
    expect(pathsOf(body)).toEqual(['speakers.3.aim.kind']);
    const second = await call({ ...BODY, speakers: [{ channel: 'L', xM: 5.5, yM: 1, zM: 1 }, { channel: 'C', ...listener }, { channel: 'R', ...at(-30), aim: { kind: 'seat', seatId: 'nobody' } }] });
    expect(pathsOf(second.body)).toEqual(['speakers.0.xM', 'speakers.1.xM', 'speakers.2.aim.seatId']);
  });
  it('a negative mains or sub delay, a trim beyond ±30 dB and a text gain, by their paths', async () => {
    const { status, body } = await call({ ...BODY, mainsDelayMs: -1, speakers: [{ ...ITU_51[0], trimDb: 31 }], subs: [{ name: 'Sub', ...at(40, 3.5, 0.3), delayMs: -0.5, gainDb: 'loud' }] });
    expect(status).toBe(400);
    expect(pathsOf(body)).toEqual(['mainsDelayMs', 'speakers.0.trimDb', 'subs.0.delayMs', 'subs.0.gainDb']);
  });
  it('non-numeric coordinates, a negative temperature below −20 °C and 33 speakers', async () => {
    expect(pathsOf((await call({ ...BODY, temperatureC: -40, speakers: [{ ...ITU_51[0], yM: 'front' }] })).body)).toEqual(['speakers.0.yM', 'temperatureC']);
    expect(pathsOf((await call({ ...BODY, speakers: Array.from({ length: 33 }, () => ITU_51[0]) })).body)).toEqual(['speakers']);
  });
  it('415 for a non-JSON body and 413 above 256 kB', async () => {
    expect((await call('template=5.1', { 'content-type': 'application/x-www-form-urlencoded' })).status).toBe(415);
    expect((await call({ ...BODY, padding: 'x'.repeat(257 * 1024) })).status).toBe(413);
  });
});
