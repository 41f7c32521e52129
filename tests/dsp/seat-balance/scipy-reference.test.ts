import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { logFrequencyGridHz, modalTransfers, optimizeSubSettings, SEAT_BALANCE_DEFAULT_LIMITS, seatBalanceEvaluator, type SubSetting } from '@/dsp';
import { assertInDelta } from '../../helpers/assert-in-delta';

interface Point {
  x: number;
  y: number;
  z: number;
}
interface Limits {
  maxDelayMs: number;
  minGainDb: number;
  maxGainDb: number;
  maxOutputLossDb: number;
}
interface FixtureRoom {
  name: string;
  /** The box and floor of this room's search (the product defaults unless the room names its own). */
  limits: Limits;
  room: { lengthM: number; widthM: number; heightM: number };
  rt60S: number;
  temperatureC: number;
  subs: Point[];
  seats: Point[];
  neutralObjectiveDb: number;
  neutralMeanLevelDb: number;
  bestSettings: SubSetting[];
  bestObjectiveDb: number;
  bestMeanLevelDb: number;
  evaluations: number;
  /** |H| of the first sub at the first seat on the grid, dB re 1 Pa per m³/s (numpy's modal sum). */
  firstTransferDb: number[];
}
interface Fixture {
  source: string;
  grid: { startHz: number; stopHz: number; pointsPerOctave: number };
  band: { startHz: number; stopHz: number };
  limits: Limits;
  maxModeHz: number;
  frequencyHz: number[];
  rooms: FixtureRoom[];
}

const fixture = JSON.parse(readFileSync(new URL('../fixtures/seat-balance-scipy.json', import.meta.url), 'utf8')) as Fixture;
const SOURCE = `reference library: scipy.optimize.differential_evolution, fixture made by scripts/reference/seat-balance-fixtures.py (${fixture.source})`;

/** Seamline's modal sums and evaluator for one fixture room, on the fixture's own grid and band. */
function seamlineEvaluator(room: FixtureRoom) {
  const { transfers } = modalTransfers({
    room: room.room,
    sourcesM: room.subs,
    receiversM: room.seats,
    frequencyHz: fixture.frequencyHz,
    rt60S: room.rt60S,
    temperatureC: room.temperatureC,
    maxModeHz: fixture.maxModeHz,
  });
  const evaluator = seatBalanceEvaluator({ frequencyHz: fixture.frequencyHz, transfers, ...fixture.band, maxOutputLossDb: room.limits.maxOutputLossDb });
  return { transfers, evaluator };
}

describe(`Seat balance against an independent numpy + scipy implementation (${SOURCE})`, () => {
  it('the fixture uses the product limits (one room cuts only, with a floor that binds), 1.5 × the top frequency for modes and a grid logFrequencyGridHz makes', () => {
    const { maxDelayMs, minGainDb, maxGainDb, maxOutputLossDb } = SEAT_BALANCE_DEFAULT_LIMITS;
    expect(fixture.limits).toEqual({ maxDelayMs, minGainDb, maxGainDb, maxOutputLossDb });
    expect(fixture.rooms.filter((r) => r.limits.maxGainDb === maxGainDb && r.limits.maxOutputLossDb === maxOutputLossDb).length).toBeGreaterThanOrEqual(3);
    // Raising every gain together restores the level without changing the spread, so the floor only binds when boost
    // is limited: the cut-only room's optimum sits on its floor.
    const bound = fixture.rooms.filter((r) => Math.abs(r.bestMeanLevelDb + r.limits.maxOutputLossDb) < 0.01);
    expect(bound.length).toBeGreaterThanOrEqual(1);
    const grid = logFrequencyGridHz(fixture.grid);
    expect(grid.length).toBe(fixture.frequencyHz.length);
    fixture.frequencyHz.forEach((f, i) => assertInDelta(grid[i] as number, f, 1e-9 * f, `grid point ${i}`));
    assertInDelta(fixture.maxModeHz, 1.5 * (fixture.frequencyHz.at(-1) as number), 1e-9, 'maxModeHz');
  });

  it('at least three invented rooms of different sizes, 2–4 subs, 3–8 seats, RT60 0.3–0.6 s', () => {
    expect(fixture.rooms.length).toBeGreaterThanOrEqual(3);
    expect(fixture.rooms.some((r) => r.subs.length === 4 && r.seats.length === 8)).toBe(true);
    expect(new Set(fixture.rooms.map((r) => `${r.room.lengthM}×${r.room.widthM}×${r.room.heightM}`)).size).toBe(fixture.rooms.length);
    for (const r of fixture.rooms) {
      expect(r.name).toMatch(/\(invented\)$/);
      expect(r.subs.length).toBeGreaterThanOrEqual(2);
      expect(r.subs.length).toBeLessThanOrEqual(4);
      expect(r.seats.length).toBeGreaterThanOrEqual(3);
      expect(r.seats.length).toBeLessThanOrEqual(8);
      expect(r.rt60S).toBeGreaterThanOrEqual(0.3);
      expect(r.rt60S).toBeLessThanOrEqual(0.6);
    }
  });

  fixture.rooms.forEach((room) => {
    describe(`${room.name}: ${room.subs.length} subs, ${room.seats.length} seats`, () => {
      it('the modal sum of the first sub at the first seat matches numpy within 0.01 dB at every grid point (Kuttruff, "Room Acoustics", ch. 3)', () => {
        const { transfers } = seamlineEvaluator(room);
        assertInDelta(transfers[0]![0]!.magnitudeDb, room.firstTransferDb, 0.01, 'sub 1 → seat 1 dB');
      });

      it('the neutral settings and scipy’s settings measure the same in both implementations (objective and level within 0.01 dB)', () => {
        const { evaluator } = seamlineEvaluator(room);
        const neutral = evaluator.measure(room.subs.map(() => ({ delayMs: 0, gainDb: 0, invert: false })));
        assertInDelta(neutral.objectiveDb, room.neutralObjectiveDb, 0.01, 'neutral objective dB');
        assertInDelta(neutral.meanLevelDb, room.neutralMeanLevelDb, 0.01, 'neutral level dB');
        const best = evaluator.measure(room.bestSettings);
        assertInDelta(best.objectiveDb, room.bestObjectiveDb, 0.01, 'scipy settings objective dB');
        assertInDelta(best.meanLevelDb, room.bestMeanLevelDb, 0.01, 'scipy settings level dB');
        // scipy kept its limits and floor and found a real improvement, so (b) below is a meaningful bar.
        expect(best.meanLevelDb).toBeGreaterThanOrEqual(-room.limits.maxOutputLossDb - 0.01);
        for (const s of room.bestSettings) {
          expect(s.gainDb).toBeGreaterThanOrEqual(room.limits.minGainDb - 1e-9);
          expect(s.gainDb).toBeLessThanOrEqual(room.limits.maxGainDb + 1e-9);
        }
        expect(room.bestObjectiveDb).toBeLessThan(room.neutralObjectiveDb - 0.5);
      });

      it.each([1, 2, 3, 4])('optimizeSubSettings (default budget, seed %i) reaches scipy’s objective within 0.2 dB, inside its limits and floor', (seed) => {
        const { evaluator } = seamlineEvaluator(room);
        const { maxDelayMs, minGainDb, maxGainDb } = room.limits;
        const r = optimizeSubSettings({ evaluator, seed, limits: { maxDelayMs, minGainDb, maxGainDb } });
        const remeasured = evaluator.measure(r.settings);
        assertInDelta(remeasured.objectiveDb, r.after.objectiveDb, 1e-9, 'answer re-measured');
        expect(remeasured.withinFloor).toBe(true);
        expect(remeasured.meanLevelDb).toBeGreaterThanOrEqual(-room.limits.maxOutputLossDb - 1e-9);
        for (const s of r.settings) {
          expect(s.delayMs).toBeGreaterThanOrEqual(0);
          expect(s.delayMs).toBeLessThanOrEqual(maxDelayMs);
          expect(s.gainDb).toBeGreaterThanOrEqual(minGainDb);
          expect(s.gainDb).toBeLessThanOrEqual(maxGainDb);
        }
        const message = `seed ${seed}: ours ${remeasured.objectiveDb.toFixed(3)} dB vs scipy ${room.bestObjectiveDb.toFixed(3)} dB (neutral ${room.neutralObjectiveDb.toFixed(3)} dB)`;
        expect(remeasured.objectiveDb, message).toBeLessThanOrEqual(room.bestObjectiveDb + 0.2);
      }, 60_000);
    });
  });
});
