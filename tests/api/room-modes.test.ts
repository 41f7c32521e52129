import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/room-modes/route';
import { assertInDelta } from '../helpers/assert-in-delta';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field
type Json = any;

async function call(body: unknown, headers: Record<string, string> = { 'content-type': 'application/json' }): Promise<{ status: number; body: Json }> {
  const res = await POST(new Request('http://x/api/v1/room-modes', { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: await res.json() };
}

const JUNIPER = { lengthM: 6.4, widthM: 4.9, heightM: 2.7, maxHz: 200, temperatureC: 20, rt60S: 0.4 };
const pathsOf = (body: Json): string[] => body.error.issues.map((i: { path: string }) => i.path);

describe('POST /api/v1/room-modes — the documented contract', () => {
  it('6.4 × 4.9 × 2.7 m at 20 °C: first modes 26.81, 35.02, 44.11, 53.63, 63.56, 64.05, 68.98, 70.04 Hz with their indices (published: Rayleigh 1896; Everest & Pohlmann, Master Handbook of Acoustics)', async () => {
    const { status, body } = await call(JUNIPER);
    expect(status).toBe(200);
    assertInDelta(body.speedOfSoundMps, 343.21, 0.01, 'c at 20 °C (published: Kinsler et al. 2000)');
    const expected: [number, [number, number, number], string][] = [
      [26.81, [1, 0, 0], 'axial'],
      [35.02, [0, 1, 0], 'axial'],
      [44.11, [1, 1, 0], 'tangential'],
      [53.63, [2, 0, 0], 'axial'],
      [63.56, [0, 0, 1], 'axial'],
      [64.05, [2, 1, 0], 'tangential'],
      [68.98, [1, 0, 1], 'tangential'],
      [70.04, [0, 2, 0], 'axial'],
    ];
    expected.forEach(([hz, indices, kind], i) => {
      assertInDelta(body.modes[i].frequencyHz, hz, 0.006, `mode ${i}`);
      expect(body.modes[i].indices).toEqual(indices);
      expect(body.modes[i].kind).toBe(kind);
    });
  });

  it('holds 106 modes at or below 200 Hz, sorted by frequency, (0,0,0) excluded; kinds add up (published: Rayleigh 1896, the mode formula)', async () => {
    const { body } = await call(JUNIPER);
    expect(body.modes).toHaveLength(106);
    for (let i = 1; i < body.modes.length; i++) expect(body.modes[i].frequencyHz).toBeGreaterThanOrEqual(body.modes[i - 1].frequencyHz);
    expect(body.modes.every((m: Json) => m.frequencyHz <= 200 && m.indices.some((n: number) => n > 0))).toBe(true);
    expect(body.kindCounts.axial + body.kindCounts.tangential + body.kindCounts.oblique).toBe(106);
    const oblique = body.modes.find((m: Json) => m.indices.every((n: number) => n > 0));
    expect(oblique.kind).toBe('oblique');
  });

  it('Schroeder frequency 137.5 Hz for V = 84.67 m³, T60 = 0.4 s (published: Schroeder, JASA 99(5), 1996)', async () => {
    const { body } = await call(JUNIPER);
    assertInDelta(body.schroederHz, 137.5, 0.05, 'schroederHz');
    assertInDelta(body.volumeM3, 84.672, 0.001, 'volumeM3');
  });

  it("Kuttruff's statistical count gives 107.3 at 200 Hz, within a few percent of the 106 enumerated (published: Kuttruff, Room Acoustics, ch. 3)", async () => {
    const { body } = await call(JUNIPER);
    assertInDelta(body.statisticalCount.expected, 107.3, 0.05, 'expected');
    expect(body.statisticalCount.enumerated).toBe(106);
    expect(body.statisticalCount.source).toMatch(/Kuttruff/);
  });

  it('one-third-octave counts (IEC 61260-1 base-ten bands) cover every mode in complete bands, and the Bonello verdict names the bands at fault (published: Bonello, JAES 29(9), 1981)', async () => {
    const { body } = await call(JUNIPER);
    const bands = body.thirdOctaveBands as Json[];
    expect(bands.length).toBeGreaterThan(5);
    expect(bands.every((b) => b.upperHz <= 200)).toBe(true);
    for (const b of bands) {
      const inside = body.modes.filter((m: Json) => m.frequencyHz >= b.lowerHz * 0.9999 && m.frequencyHz < b.upperHz * 0.9999).length;
      expect(b.count).toBe(inside);
      expect(b.axial + b.tangential + b.oblique).toBe(b.count);
    }
    assertInDelta(bands[0].centerHz, 25.12, 0.01, 'first complete band above 20 Hz');
    // Each band is labelled with its nominal mid-band frequency (published: IEC 61260-1, nominal mid-band frequencies).
    expect(bands.map((b) => b.nominalHz)).toEqual([25, 31.5, 40, 50, 63, 80, 100, 125, 160, 200].slice(0, bands.length));
    // (0,0,1) at 63.56 Hz and (2,1,0) at 64.05 Hz are 0.49 Hz apart in the 63 Hz band, which holds fewer than five modes.
    expect(body.bonello.coincidencesAtHz).toContain(63.1);
    expect(body.bonello.passes).toBe(false);
    expect(body.bonello.source).toMatch(/Bonello/);
    const pair = body.nearCoincident.pairs.find((p: Json) => p.lower.join() === '0,0,1');
    expect(pair.upper).toEqual([2, 1, 0]);
    assertInDelta(pair.separationHz, 0.492, 0.002, 'separation');
  });

  it('ITU-R BS.1116-3 proportions: 6.4 × 4.9 × 2.7 passes; 5 × 5 × 2.5 fails 1.1·w/h ≤ l/h; 8 × 4 × 2.4 fails l/h < 3 (published: ITU-R BS.1116-3, 2015)', async () => {
    expect((await call(JUNIPER)).body.proportions.passes).toBe(true);
    const square = (await call({ ...JUNIPER, lengthM: 5, widthM: 5, heightM: 2.5 })).body.proportions;
    expect(square.passes).toBe(false);
    expect(square.criteria.find((c: Json) => c.name === '1.1·w/h ≤ l/h').passes).toBe(false);
    const long = (await call({ ...JUNIPER, lengthM: 8, widthM: 4, heightM: 2.4 })).body.proportions;
    expect(long.passes).toBe(false);
    expect(long.criteria.find((c: Json) => c.name === 'l/h < 3').passes).toBe(false);
    assertInDelta(long.lengthToHeight, 3.333, 0.001, 'l/h');
  });

  it('a warmer room raises every mode with the speed of sound (published: Kinsler et al. 2000, c = 331.3·√(1 + T/273.15))', async () => {
    const warm = (await call({ ...JUNIPER, temperatureC: 30, maxHz: 40 })).body;
    const c30 = 331.3 * Math.sqrt(1 + 30 / 273.15);
    assertInDelta(warm.modes[0].frequencyHz, c30 / (2 * 6.4), 0.001, '(1,0,0) at 30 °C');
  });
});

describe('POST /api/v1/room-modes — bad input answered with the field named', () => {
  it('missing, non-numeric and out-of-range fields: 400 with each path', async () => {
    const { status, body } = await call({ lengthM: 'six', widthM: -1, heightM: 2.7, maxHz: 200, temperatureC: 20 });
    expect(status).toBe(400);
    expect(body.error.code).toBe('invalid');
    expect(pathsOf(body).sort()).toEqual(['lengthM', 'rt60S', 'widthM']);
    expect(body.error.issues.find((i: Json) => i.path === 'rt60S').message).toBe('is required');
    expect(body.error.issues.find((i: Json) => i.path === 'widthM').message).toMatch(/at least 1 m/);
  });
  it('maxHz above 500 Hz is refused naming maxHz', async () => {
    const { status, body } = await call({ ...JUNIPER, maxHz: 800 });
    expect(status).toBe(400);
    expect(pathsOf(body)).toEqual(['maxHz']);
    expect(body.error.issues[0].message).toMatch(/at most 500 Hz/);
  });
  it('a room that would answer more than 5000 modes is refused naming maxHz (mode-count cap)', async () => {
    const { status, body } = await call({ ...JUNIPER, lengthM: 40, widthM: 30, heightM: 12, maxHz: 300 });
    expect(status).toBe(400);
    expect(pathsOf(body)).toEqual(['maxHz']);
    expect(body.error.issues[0].message).toMatch(/at most 5000/);
  });
  it('temperature outside −20…50 °C and rt60S of 0 are refused by name', async () => {
    const { body } = await call({ ...JUNIPER, temperatureC: 80, rt60S: 0 });
    expect(pathsOf(body).sort()).toEqual(['rt60S', 'temperatureC']);
  });
  it('NaN-like values (null) and a non-object body are 400', async () => {
    expect(pathsOf((await call({ ...JUNIPER, heightM: null })).body)).toEqual(['heightM']);
    const arr = await call([1, 2]);
    expect(arr.status).toBe(400);
  });
  it('broken JSON is 400, a non-JSON media type 415, a body over 256 kB 413', async () => {
    const broken = await call('{"lengthM":');
    expect(broken.status).toBe(400);
    expect(pathsOf(broken.body)).toEqual(['(body)']);
    expect((await call('lengthM=6.4', { 'content-type': 'text/plain' })).status).toBe(415);
    const big = await call({ ...JUNIPER, padding: 'x'.repeat(300 * 1024) });
    expect(big.status).toBe(413);
    expect(big.body.error.code).toBe('too_large');
  });
});
