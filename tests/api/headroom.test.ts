import { describe, expect, it } from 'vitest';
import { POST } from '@/app/api/v1/headroom/route';
import { assertInDelta } from '../helpers/assert-in-delta';

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- answers are checked field by field
type Json = any;

async function call(body: unknown, headers: Record<string, string> = { 'content-type': 'application/json' }): Promise<{ status: number; body: Json }> {
  const res = await POST(new Request('http://x/api/v1/headroom', { method: 'POST', headers, body: typeof body === 'string' ? body : JSON.stringify(body) }), undefined as never);
  return { status: res.status, body: await res.json() };
}

const L = { name: 'L', sensitivityDb: 87, sensitivityRef: '1W', impedanceOhm: 8, powerW: 100, distanceM: 3 };
const SUB = { name: 'Sub 1', sensitivityDb: 88, sensitivityRef: '1W', impedanceOhm: 4, powerW: 500, distanceM: 3.4 };
const pathsOf = (body: Json): string[] => body.error.issues.map((i: { path: string }) => i.path).sort();

describe('POST /api/v1/headroom — inverse-square law against reference level (published: Kinsler et al. 2000; SMPTE RP 200)', () => {
  it('87 dB / 1 W / 1 m with 100 W at 3 m → 97.46 dB SPL: 7.54 dB short of 105 dB peaks, needing 567.9 W', async () => {
    const { status, body } = await call({ channels: [L] });
    expect(status).toBe(200);
    const row = body.channels[0];
    assertInDelta(row.maxSplDb, 97.46, 0.005, 'max SPL');
    expect(row.targetPeakDb).toBe(105);
    assertInDelta(row.headroomDb, -7.54, 0.005, 'headroom');
    assertInDelta(row.deficitDb, 7.54, 0.005, 'deficit');
    expect(row.meetsTarget).toBe(false);
    assertInDelta(row.powerNeededW, 100 * 10 ** (7.5425 / 10), 0.5, 'power needed');
    expect(body.referenceLevelDb).toBe(85);
  });

  it('2.83 V into 4 Ω is 2 W: 90 dB/2.83 V at 4 Ω is 86.99 dB/1 W; into 8 Ω the two ratings agree (published: Ohm’s law, P = V²/R)', async () => {
    const { body } = await call({ channels: [{ ...L, sensitivityDb: 90, sensitivityRef: '2.83V', impedanceOhm: 4 }, { ...L, name: 'R', sensitivityDb: 87, sensitivityRef: '2.83V' }] });
    assertInDelta(body.channels[0].sensitivity1WDb, 90 - 10 * Math.log10(2), 0.005, '4 Ω');
    assertInDelta(body.channels[1].maxSplDb, 97.46, 0.005, '8 Ω');
  });

  it('two units in phase add 20·log10(2) = 6.02 dB; room gain adds as given', async () => {
    const { body } = await call({ channels: [{ ...L, count: 2, roomGainDb: 3 }] });
    assertInDelta(body.channels[0].maxSplDb, 97.46 + 6.02 + 3, 0.01, 'count + room gain');
    assertInDelta(body.channels[0].perUnitSplDb, 97.46, 0.005, 'per unit');
  });

  it('subs: one sub is held to 115 dB (LFE +10 dB, common practice); two subs together (+6.02 dB in phase) against 115 dB, each to its share', async () => {
    const one = (await call({ subs: [SUB] })).body;
    expect(one.subs[0].targetPeakDb).toBe(115);
    const perSub = 88 + 10 * Math.log10(500) - 20 * Math.log10(3.4);
    assertInDelta(one.subs[0].maxSplDb, perSub, 0.005, 'sub max SPL');
    const two = (await call({ subs: [SUB, { ...SUB, name: 'Sub 2' }] })).body;
    assertInDelta(two.subsCombined.maxSplDb, perSub + 20 * Math.log10(2), 0.01, 'two subs in phase');
    expect(two.subsCombined.targetPeakDb).toBe(115);
    assertInDelta(two.subs[0].targetPeakDb, 115 - 6.02, 0.005, 'share of each sub');
    const power = (await call({ subs: [SUB, { ...SUB, name: 'Sub 2' }], subSummation: 'power' })).body;
    assertInDelta(power.subsCombined.maxSplDb, perSub + 10 * Math.log10(2), 0.01, 'uncorrelated');
  });

  it('rated power: says when the power needed exceeds the speaker’s rating; a custom target is honoured', async () => {
    const { body } = await call({ channels: [{ ...L, ratedPowerW: 120 }, { ...L, name: 'C', targetPeakDb: 95, ratedPowerW: 120 }] });
    expect(body.channels[0].exceedsRatedPower).toBe(true);
    expect(body.channels[1].meetsTarget).toBe(true);
    assertInDelta(body.channels[1].headroomDb, 2.46, 0.005, 'against 95 dB');
  });

  it('a 200 W amplifier on a 120 W-rated speaker: the rating binds; both maxima given (by hand: 87 + 10·log10 P − 9.54, inverse-square/power law, Kinsler et al. 2000)', async () => {
    const { body } = await call({ channels: [{ ...L, powerW: 200, ratedPowerW: 120 }] });
    const row = body.channels[0];
    expect(row.binding).toBe('speaker');
    assertInDelta(row.amplifierSplDb, 97.46 + 10 * Math.log10(2), 0.01, 'with the full amplifier');
    assertInDelta(row.ratedSplDb, 97.46 + 10 * Math.log10(1.2), 0.01, 'at the rating');
    assertInDelta(row.maxSplDb, row.ratedSplDb, 1e-9, 'the binding limit');
    assertInDelta(row.headroomDb, row.ratedSplDb - 105, 0.01, 'verdict at the rating');
  });

  it('hearing safety: NIOSH 85 dBA for 8 h with a 3 dB exchange — 100 dBA for 15 minutes (published: NIOSH 1998), and installation cautions', async () => {
    const { body } = await call({ channels: [L] });
    expect(body.exposure.find((e: Json) => e.levelDba === 85).minutes).toBe(480);
    expect(body.exposure.find((e: Json) => e.levelDba === 100).minutes).toBe(15);
    expect(body.safety.join(' ')).toMatch(/NIOSH/);
    expect(body.safety.join(' ')).toMatch(/local building and electrical codes/);
  });
});

describe('POST /api/v1/headroom — bad input answered with the field named', () => {
  it('nothing to check is refused naming channels', async () => {
    const { status, body } = await call({});
    expect(status).toBe(400);
    expect(pathsOf(body)).toEqual(['channels']);
  });
  it('a bad sensitivity reference, zero power, a fractional count and a missing distance', async () => {
    const { body } = await call({ channels: [{ ...L, sensitivityRef: '1V', powerW: 0 }], subs: [{ ...SUB, count: 1.5, distanceM: undefined }] });
    expect(pathsOf(body)).toEqual(['channels.0.powerW', 'channels.0.sensitivityRef', 'subs.0.count', 'subs.0.distanceM']);
    expect(body.error.issues.find((i: Json) => i.path === 'subs.0.distanceM').message).toBe('is required');
  });
  it('out-of-range sensitivity and impedance, and nine subs', async () => {
    expect(pathsOf((await call({ channels: [{ ...L, sensitivityDb: 200, impedanceOhm: 0.5 }] })).body)).toEqual(['channels.0.impedanceOhm', 'channels.0.sensitivityDb']);
    expect(pathsOf((await call({ subs: Array.from({ length: 9 }, () => SUB) })).body)).toEqual(['subs']);
    expect(pathsOf((await call({ subs: [SUB], subSummation: 'loud' })).body)).toEqual(['subSummation']);
  });
  it('415 for a non-JSON body and 413 above 256 kB', async () => {
    expect((await call('{}', { 'content-type': 'text/csv' })).status).toBe(415);
    expect((await call({ channels: [{ ...L, name: 'x'.repeat(300 * 1024) }] })).status).toBe(413);
  });
});
