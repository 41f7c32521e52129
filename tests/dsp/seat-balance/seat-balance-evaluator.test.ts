/**
 * seatBalanceEvaluator is the measuring stick of Seat balance. Its oracles here are independent of it:
 * - a second evaluation with complex.js: p_k = Σ_s H_sk·g_s·(±1)·e^(−jωτ_s) (superposition; definition of a delay),
 *   20·log10|p_k| per seat, max − min per frequency, averaged over the band (common practice: loudest minus quietest seat);
 * - room-response's own path: summedModalResponse at each seat, then seatSpreadDb over those seat curves.
 */
import Complex from 'complex.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { logFrequencyGridHz, modalTransfers, seatBalanceEvaluator, seatSpreadDb, summedModalResponse, type SeatTransfer, type SubSetting } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

const NEUTRAL: SubSetting = { delayMs: 0, gainDb: 0, invert: false };
const GRID_HZ = Array.from(logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 12 }));

/** Random transfers on GRID_HZ: magnitudes 0.05…3, any phase, from fast-check's seeded numbers. */
const transfersArb = (subs: number, seats: number): fc.Arbitrary<SeatTransfer[][]> =>
  fc
    .array(fc.tuple(fc.double({ min: 0.05, max: 3, noNaN: true }), fc.double({ min: -Math.PI, max: Math.PI, noNaN: true })), {
      minLength: subs * seats * GRID_HZ.length,
      maxLength: subs * seats * GRID_HZ.length,
    })
    .map((flat) =>
      Array.from({ length: subs }, (_, s) =>
        Array.from({ length: seats }, (__, k) => {
          const part = flat.slice((s * seats + k) * GRID_HZ.length, (s * seats + k + 1) * GRID_HZ.length);
          return { re: part.map(([a, p]) => a * Math.cos(p)), im: part.map(([a, p]) => a * Math.sin(p)) };
        }),
      ),
    );
const settingArb: fc.Arbitrary<SubSetting> = fc.record({ delayMs: fc.double({ min: 0, max: 20, noNaN: true }), gainDb: fc.double({ min: -12, max: 6, noNaN: true }), invert: fc.boolean() });

/** Each seat's complex pressure at grid point i, with complex.js (superposition). */
function seatPressures(transfers: SeatTransfer[][], settings: SubSetting[], i: number): Complex[] {
  const w = 2 * Math.PI * (GRID_HZ[i] as number);
  return (transfers[0] as SeatTransfer[]).map((_, k) =>
    transfers.reduce((sum, row, s) => {
      const st = settings[s] as SubSetting;
      const h = new Complex((row[k] as SeatTransfer).re[i] as number, (row[k] as SeatTransfer).im[i] as number);
      const g = new Complex({ abs: 10 ** (st.gainDb / 20) * (st.invert ? -1 : 1), arg: 0 });
      return sum.add(h.mul(g).mul(new Complex({ abs: 1, arg: (-w * st.delayMs) / 1000 })));
    }, Complex.ZERO),
  );
}

/** The oracle's measures: mean and largest spread over the band, and the power-mean level relative to neutral. */
function oracle(transfers: SeatTransfer[][], settings: SubSetting[], startHz: number, stopHz: number) {
  const band = GRID_HZ.map((f, i) => [f, i] as const).filter(([f]) => f >= startHz && f <= stopHz);
  const neutral = settings.map(() => NEUTRAL);
  let spreadSum = 0;
  let maxSpread = -Infinity;
  let power = 0;
  let neutralPower = 0;
  for (const [, i] of band) {
    const levels = seatPressures(transfers, settings, i).map((p) => 20 * Math.log10(p.abs()));
    const spread = Math.max(...levels) - Math.min(...levels);
    spreadSum += spread;
    maxSpread = Math.max(maxSpread, spread);
    power += seatPressures(transfers, settings, i).reduce((a, p) => a + p.abs() ** 2, 0);
    neutralPower += seatPressures(transfers, neutral, i).reduce((a, p) => a + p.abs() ** 2, 0);
  }
  return { meanSpreadDb: spreadSum / band.length, maxSpreadDb: maxSpread, meanLevelDb: 10 * Math.log10(power / neutralPower) };
}

describe('seatBalanceEvaluator: the objective is the mean over the band of loudest − quietest seat (common practice)', () => {
  it('equals a second evaluation with complex.js for random transfers and settings (1e-9 dB)', () => {
    const problem = fc.integer({ min: 1, max: 4 }).chain((subs) =>
      fc.integer({ min: 2, max: 5 }).chain((seats) => fc.tuple(transfersArb(subs, seats), fc.array(settingArb, { minLength: subs, maxLength: subs }))),
    );
    fc.assert(
      fc.property(problem, ([transfers, settings]) => {
        const ev = seatBalanceEvaluator({ frequencyHz: GRID_HZ, transfers, startHz: 20, stopHz: 120, maxOutputLossDb: 3 });
        const m = ev.measure(settings);
        const o = oracle(transfers, settings, 20, 120);
        assertInDelta(m.meanSpreadDb, o.meanSpreadDb, 1e-9, 'meanSpreadDb');
        assertInDelta(m.maxSpreadDb, o.maxSpreadDb, 1e-9, 'maxSpreadDb');
        assertInDelta(m.meanLevelDb, o.meanLevelDb, 1e-9, 'meanLevelDb');
        assertInDelta(m.objectiveDb, o.meanSpreadDb, 1e-9, 'objectiveDb (equal weights)');
        expect(m.withinFloor).toBe(o.meanLevelDb >= -3);
        // score() is the same objective and level, packed; its phasors come from an interpolated sine table (error
        // below 3e-7 of the amplitude, so well under 1e-4 dB here): the search's measure, while answers use measure().
        const out = { objectiveDb: 0, meanLevelDb: 0 };
        ev.score(Float64Array.from(settings, (s) => s.delayMs), Float64Array.from(settings, (s) => s.gainDb), Uint8Array.from(settings, (s) => (s.invert ? 1 : 0)), out);
        assertInDelta(out.objectiveDb, o.meanSpreadDb, 1e-4, 'score objective');
        assertInDelta(out.meanLevelDb, o.meanLevelDb, 1e-4, 'score level');
      }),
      { numRuns: 25, seed: 15 },
    );
  });

  it('the band is inclusive and only its points count; bandHz lists them', () => {
    const transfers = fc.sample(transfersArb(2, 3), { numRuns: 1, seed: 3 })[0] as SeatTransfer[][];
    const startHz = GRID_HZ[5] as number;
    const stopHz = GRID_HZ[20] as number;
    const ev = seatBalanceEvaluator({ frequencyHz: GRID_HZ, transfers, startHz, stopHz });
    expect(Array.from(ev.bandHz)).toEqual(GRID_HZ.slice(5, 21));
    const settings = [NEUTRAL, { delayMs: 3.3, gainDb: -2, invert: true }];
    assertInDelta(ev.measure(settings).meanSpreadDb, oracle(transfers, settings, startHz, stopHz).meanSpreadDb, 1e-9, 'narrow band');
  });

  it('equals seatSpreadDb over summedModalResponse seat curves, room-response’s path (1e-6 dB)', () => {
    const room = { lengthM: 6.1, widthM: 4.3, heightM: 2.6 };
    const grid = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 48 });
    const point = fc.record({ x: fc.double({ min: 0, max: room.widthM, noNaN: true }), y: fc.double({ min: 0, max: room.lengthM, noNaN: true }), z: fc.double({ min: 0, max: room.heightM, noNaN: true }) });
    const problem = fc.integer({ min: 1, max: 3 }).chain((subs) =>
      fc.tuple(fc.array(point, { minLength: subs, maxLength: subs }), fc.array(point, { minLength: 2, maxLength: 4 }), fc.array(settingArb, { minLength: subs, maxLength: subs })),
    );
    fc.assert(
      fc.property(problem, ([subsM, seatsM, settings]) => {
        const common = { room, frequencyHz: grid, rt60S: 0.35, temperatureC: 21, maxModeHz: 300 };
        const t = modalTransfers({ ...common, sourcesM: subsM, receiversM: seatsM });
        const m = seatBalanceEvaluator({ frequencyHz: t.frequencyHz, transfers: t.transfers, startHz: 20, stopHz: 120 }).measure(settings);
        const curves = seatsM.map(
          (receiverM) => summedModalResponse({ ...common, receiverM, sources: subsM.map((positionM, s) => ({ positionM, ...(settings[s] as SubSetting) })) }).sum.magnitudeDb,
        );
        const path = seatSpreadDb({ frequencyHz: grid, seatsMagnitudeDb: curves, startHz: 20, stopHz: 120 });
        assertInDelta(m.meanSpreadDb, path.meanSpreadDb, 1e-6, 'meanSpreadDb');
        assertInDelta(m.maxSpreadDb, path.maxSpreadDb, 1e-6, 'maxSpreadDb');
      }),
      { numRuns: 15, seed: 151 },
    );
  });
});

describe('seatBalanceEvaluator: weights and level', () => {
  const transfers = fc.sample(transfersArb(2, 4), { numRuns: 1, seed: 7 })[0] as SeatTransfer[][];
  const settings = [{ delayMs: 1.7, gainDb: -1.5, invert: false }, { delayMs: 0, gainDb: 2, invert: true }];
  const base = { frequencyHz: GRID_HZ, transfers, startHz: 20, stopHz: 120 };

  it('equal weights (any size) give the plain spread', () => {
    const plain = seatBalanceEvaluator(base).measure(settings);
    const weighted = seatBalanceEvaluator({ ...base, seatWeights: [2.5, 2.5, 2.5, 2.5] }).measure(settings);
    assertInDelta(weighted.objectiveDb, plain.meanSpreadDb, 1e-12, 'objective');
    assertInDelta(weighted.meanSpreadDb, plain.meanSpreadDb, 1e-12, 'meanSpreadDb');
  });

  it('a seat of weight 0 drops out: the objective equals the spread of the other seats alone', () => {
    const without = transfers.map((row) => [row[0]!, row[1]!, row[3]!]);
    const alone = seatBalanceEvaluator({ ...base, transfers: without }).measure(settings);
    const weighted = seatBalanceEvaluator({ ...base, seatWeights: [1, 1, 0, 1] }).measure(settings);
    assertInDelta(weighted.objectiveDb, alone.meanSpreadDb, 1e-9, 'objective without seat 3');
    // meanSpreadDb stays the plain all-seat figure (room-response's number); the level ignores the weight-0 seat.
    assertInDelta(weighted.meanSpreadDb, oracle(transfers, settings, 20, 120).meanSpreadDb, 1e-9, 'meanSpreadDb of all seats');
    assertInDelta(weighted.meanLevelDb, oracle(without, settings, 20, 120).meanLevelDb, 1e-9, 'level of the weighted seats');
  });

  it('unequal weights: the largest min(w_a, w_b)·|L_a − L_b| over pairs, weights scaled so the largest is 1', () => {
    const w = [1, 0.5, 2, 1];
    const got = seatBalanceEvaluator({ ...base, seatWeights: w }).measure(settings).objectiveDb;
    const band = GRID_HZ.map((f, i) => [f, i] as const).filter(([f]) => f >= 20 && f <= 120);
    let total = 0;
    for (const [, i] of band) {
      const levels = seatPressures(transfers, settings, i).map((p) => 20 * Math.log10(p.abs()));
      let worst = 0;
      for (let a = 0; a < 4; a++) for (let b = a + 1; b < 4; b++) worst = Math.max(worst, (Math.min(w[a]!, w[b]!) / 2) * Math.abs(levels[a]! - levels[b]!));
      total += worst;
    }
    assertInDelta(got, total / band.length, 1e-9, 'weighted objective');
  });

  it('the level reads 0 for every sub neutral, +6.02 dB with every sub 6.02 dB up, and inverting every sub changes nothing', () => {
    const ev = seatBalanceEvaluator(base);
    expect(ev.measure([NEUTRAL, NEUTRAL]).meanLevelDb).toBe(0);
    const up = 20 * Math.log10(2);
    // Every pressure doubles: power × 4 → +6.0206 dB (definition of the decibel).
    assertInDelta(ev.measure([{ ...NEUTRAL, gainDb: up }, { ...NEUTRAL, gainDb: up }]).meanLevelDb, 10 * Math.log10(4), 1e-9, '+6 dB');
    // Inverting every sub together changes no level and no spread.
    const inverted = ev.measure(settings.map((s) => ({ ...s, invert: !s.invert })));
    assertInDelta(inverted.meanLevelDb, ev.measure(settings).meanLevelDb, 1e-9, 'all inverted');
    assertInDelta(inverted.meanSpreadDb, ev.measure(settings).meanSpreadDb, 1e-9, 'all inverted');
  });

  it('withinFloor follows the output floor', () => {
    const quarterPowerDb = 10 * Math.log10(1 / 4);
    const down = [{ ...NEUTRAL, gainDb: -6.0206 }, { ...NEUTRAL, gainDb: -6.0206 }];
    expect(seatBalanceEvaluator({ ...base, maxOutputLossDb: 3 }).measure(down).withinFloor).toBe(false);
    expect(seatBalanceEvaluator({ ...base, maxOutputLossDb: 6.1 }).measure(down).withinFloor).toBe(true);
    assertInDelta(seatBalanceEvaluator(base).measure(down).meanLevelDb, quarterPowerDb, 1e-3, 'level of −6 dB on every sub');
  });

  it('one seat: the spread is 0', () => {
    const one = seatBalanceEvaluator({ ...base, transfers: transfers.map((row) => [row[0]!]) }).measure(settings);
    expect(one.meanSpreadDb).toBe(0);
    expect(one.objectiveDb).toBe(0);
  });
});

describe('seatBalanceEvaluator: guards throw RangeErrors naming the parameter', () => {
  const transfers = fc.sample(transfersArb(2, 2), { numRuns: 1, seed: 9 })[0] as SeatTransfer[][];
  const base = { frequencyHz: GRID_HZ, transfers, startHz: 20, stopHz: 120 };
  const cases: [string, () => unknown, RegExp][] = [
    ['stopHz below startHz', () => seatBalanceEvaluator({ ...base, startHz: 100, stopHz: 50 }), /stopHz/],
    ['startHz 0', () => seatBalanceEvaluator({ ...base, startHz: 0 }), /startHz/],
    ['a band with no grid point', () => seatBalanceEvaluator({ ...base, startHz: 300, stopHz: 400 }), /startHz\.\.stopHz/],
    ['no subs', () => seatBalanceEvaluator({ ...base, transfers: [] }), /transfers/],
    ['no seats', () => seatBalanceEvaluator({ ...base, transfers: [[], []] }), /transfers\[0\]/],
    ['uneven seats', () => seatBalanceEvaluator({ ...base, transfers: [transfers[0]!, [transfers[1]![0]!]] }), /transfers\[1\]/],
    ['a short curve', () => seatBalanceEvaluator({ ...base, transfers: [transfers[0]!, [transfers[1]![0]!, { re: [1], im: [0] }]] }), /transfers\[1\]\[1\]/],
    ['a NaN in the band', () => seatBalanceEvaluator({ ...base, transfers: [transfers[0]!, [transfers[1]![0]!, { re: GRID_HZ.map(() => NaN), im: GRID_HZ.map(() => 0) }]] }), /transfers\[1\]\[1\]/],
    ['weights of the wrong count', () => seatBalanceEvaluator({ ...base, seatWeights: [1] }), /seatWeights/],
    ['a negative weight', () => seatBalanceEvaluator({ ...base, seatWeights: [1, -1] }), /seatWeights\[1\]/],
    ['every weight 0', () => seatBalanceEvaluator({ ...base, seatWeights: [0, 0] }), /seatWeights/],
    ['a negative output floor', () => seatBalanceEvaluator({ ...base, maxOutputLossDb: -1 }), /maxOutputLossDb/],
    ['a frequency of 0', () => seatBalanceEvaluator({ ...base, frequencyHz: [0, ...GRID_HZ.slice(1)] }), /frequencyHz/],
    ['settings of the wrong count', () => seatBalanceEvaluator(base).measure([NEUTRAL]), /settings/],
    ['a negative delay', () => seatBalanceEvaluator(base).measure([NEUTRAL, { ...NEUTRAL, delayMs: -1 }]), /settings\[1\]\.delayMs/],
    ['a NaN gain', () => seatBalanceEvaluator(base).measure([{ ...NEUTRAL, gainDb: NaN }, NEUTRAL]), /settings\[0\]\.gainDb/],
  ];
  it.each(cases)('%s', (_, call, message) => {
    expect(call).toThrow(RangeError);
    expect(call).toThrow(message);
  });
});
