import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { crossoverSweep, logFrequencyGridHz, pathResponse, rolloffMinus3DbHz, searchTiming, type MeasuredResponse, type SystemModel, type SystemSource } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

// Issue 17: "The Crossover sweep on measured curves made from the model gives the same ranking as on the model."
// The oracle is the sweep on the analog model (itself checked against scipy and hand-worked values elsewhere); the
// measured system replaces each source's speaker part (roll-offs, voicing EQ, air path) by its response on a
// 96-per-octave grid, as an in-room measurement of that speaker alone at the seat would hold it.

const lr4 = { family: 'linkwitz-riley' as const, order: 4 };
const bw2 = { family: 'butterworth' as const, order: 2 };

function measuredOf(s: SystemSource, temperatureC: number): MeasuredResponse {
  const grid = logFrequencyGridHz({ startHz: 2, stopHz: 4000, pointsPerOctave: 96 });
  const r = pathResponse(
    { name: s.name, filter: { family: 'butterworth', order: 1, response: 'none', cornerHz: 100 }, ...(s.rolloff ? { rolloff: s.rolloff } : {}), ...(s.eq ? { eq: s.eq } : {}), gainDb: 0, delayMs: 0, invert: false, distanceM: s.distanceM },
    grid,
    temperatureC,
  );
  return { frequencyHz: grid, magnitudeDb: r.magnitudeDb, phaseDeg: Array.from(r.re, (re, i) => (Math.atan2(r.im[i] as number, re) * 180) / Math.PI) };
}

/** The same system with every source's speaker part measured: no roll-off, EQ or distance of its own. */
function measuredModel(model: SystemModel): SystemModel {
  const swap = (s: SystemSource): SystemSource => ({ name: s.name, distanceM: 0, delayMs: s.delayMs, gainDb: s.gainDb, invert: s.invert, measured: measuredOf(s, model.temperatureC) });
  return { ...model, mains: swap(model.mains), subs: model.subs.map(swap) };
}

const source = (name: string, distanceM: number, delayMs: number, extra: Partial<SystemSource> = {}): SystemSource => ({ name, distanceM, delayMs, gainDb: 0, invert: false, ...extra });

describe('the Crossover sweep on measured curves made from the model', () => {
  it('ranks like the model (random Systems): the same rows in the same order, flatness within 0.05 dB, shifts within 0.05 ms', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 2, max: 5, noNaN: true }),
        fc.array(fc.record({ distanceM: fc.double({ min: 1.5, max: 7, noNaN: true }), delayMs: fc.double({ min: 0, max: 8, noNaN: true }), invert: fc.boolean() }), { minLength: 1, maxLength: 2 }),
        fc.oneof(fc.constant(45), fc.constant(60)),
        (mainsM, subs, ventHz) => {
          const model: SystemModel = {
            temperatureC: 20,
            crossoverHz: 80,
            mainsHighpass: lr4,
            subLowpass: lr4,
            mains: source('L', mainsM, 0, { rolloff: { kind: 'vented', cornerHz: ventHz } }),
            subs: subs.map((s, k) => source(`Sub ${k + 1}`, s.distanceM, s.delayMs, { invert: s.invert, rolloff: [{ kind: 'sealed', cornerHz: 22, q: 0.7 }] })),
          };
          const options = { pairings: [{ mainsFilter: lr4, subFilter: lr4 }, { mainsFilter: bw2, subFilter: lr4 }], candidatesHz: [60, 80, 100, 120] };
          const onModel = crossoverSweep({ model, ...options });
          const onMeasured = crossoverSweep({ model: measuredModel(model), ...options, mainsMinus3DbHz: rolloffMinus3DbHz(model.mains.rolloff) });
          const key = (r: (typeof onModel.rows)[number]) => `${r.crossoverHz}/${r.mainsFilter.family}${r.mainsFilter.order}/${r.present}`;
          // Rows whose flatness is within the tolerance of another row's may swap; compare the order of the rest.
          const distinct = onModel.rows.filter((r, i, all) => all.every((o, j) => j === i || Math.abs(o.flatnessDb - r.flatnessDb) > 0.1));
          const order = (rows: typeof onModel.rows) => rows.map(key).filter((k) => distinct.some((d) => key(d) === k));
          expect(order(onMeasured.rows)).toEqual(order(onModel.rows));
          expect(key(onMeasured.rows[0]!)).toBe(key(onModel.rows[0]!));
          for (const row of onModel.rows) {
            const twin = onMeasured.rows.find((r) => key(r) === key(row))!;
            assertInDelta(twin.flatnessDb, row.flatnessDb, 0.05);
            assertInDelta(twin.shiftMs, row.shiftMs, 0.05);
            expect(twin.flip).toBe(row.flip);
            expect(twin.worthIt).toBe(row.worthIt);
          }
        },
      ),
      { numRuns: 6, seed: 417 },
    );
  });

  it('Timing on the measured system recommends the model’s delay and polarity', () => {
    const model: SystemModel = {
      temperatureC: 20,
      crossoverHz: 80,
      mainsHighpass: lr4,
      subLowpass: lr4,
      mains: source('L', 3, 0, { rolloff: { kind: 'sealed', cornerHz: 50, q: 0.7 } }),
      subs: [source('Sub', 5.2, 0, { rolloff: [{ kind: 'sealed', cornerHz: 25, q: 0.7 }] })],
    };
    const a = searchTiming(model, [0]);
    const b = searchTiming(measuredModel(model), [0]);
    assertInDelta(b.best.shiftMs, a.best.shiftMs, 0.05);
    expect(b.best.flip).toBe(a.best.flip);
    assertInDelta(b.best.assessment.flatnessDb, a.best.assessment.flatnessDb, 0.05);
    expect(a.best.shiftMs).not.toBe(0); // the sub is 2.2 m farther: the model itself asks for a change
  });
});
