// Seat balance figures for npm run bench:dsp (scripts/bench-dsp.ts): prints, asserts nothing. One case, 4 subs × 8 seats
// on the 20–120 Hz band at 48 points per octave: the per-sub search (median of a few runs), the placement search over
// the 8 default candidates and, when python3 with scipy is present, the same problem through the reference script
// (scripts/reference/seat-balance-fixtures.py --bench: numpy modal sums + scipy.optimize.differential_evolution).
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { defaultSubCandidates, logFrequencyGridHz, modalTransfers, optimizeSubSettings, seatBalanceEvaluator, subPlacementSearch } from '../../dsp';
import { placementEvaluations, searchEvaluations } from '../../lib/system-model/seat-balance-work';

/** The fixture's "Four-by-eight theater (invented)": subs at the four wall midpoints, two rows of four seats. */
const problem = {
  name: 'Four-by-eight theater (invented)',
  room: { lengthM: 6.4, widthM: 4.9, heightM: 2.7 },
  rt60S: 0.4,
  temperatureC: 20,
  subs: [
    { x: 2.45, y: 0.25, z: 0.25 },
    { x: 4.65, y: 3.2, z: 0.25 },
    { x: 2.45, y: 6.15, z: 0.25 },
    { x: 0.25, y: 3.2, z: 0.25 },
  ],
  seats: [3.6, 4.6].flatMap((y) => [1.3, 2.0, 2.9, 3.6].map((x) => ({ x, y, z: 1.1 }))),
};
const band = { startHz: 20, stopHz: 120 };
const grid = logFrequencyGridHz({ ...band, pointsPerOctave: 48 });
const maxModeHz = 1.5 * (grid[grid.length - 1] as number);

interface ScipyFigures {
  objectiveDb: number;
  meanLevelDb: number;
  evaluations: number;
  modalMs: number;
  searchMs: number;
  scipy: string;
  popsize: number;
  maxiter: number;
  generations: number;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

function evaluatorFor(sourcesM: readonly { x: number; y: number; z: number }[]) {
  const { transfers } = modalTransfers({ room: problem.room, sourcesM, receiversM: problem.seats, frequencyHz: grid, rt60S: problem.rt60S, temperatureC: problem.temperatureC, maxModeHz });
  return { transfers, evaluator: seatBalanceEvaluator({ frequencyHz: grid, transfers, ...band }) };
}

function scipyFigures(): ScipyFigures | string {
  const script = fileURLToPath(new URL('../reference/seat-balance-fixtures.py', import.meta.url));
  const probe = spawnSync('python3', ['-c', 'import numpy, scipy'], { encoding: 'utf8' });
  if (probe.error || probe.status !== 0) return 'python3 with numpy and scipy not found';
  const run = spawnSync('python3', [script, '--bench'], { input: JSON.stringify(problem), encoding: 'utf8', timeout: 30 * 60_000 });
  if (run.status !== 0) return `the reference script failed (${run.error?.message ?? run.stderr.trim().split('\n').pop() ?? `status ${run.status}`})`;
  try {
    return JSON.parse(run.stdout.trim().split('\n').pop() as string) as ScipyFigures;
  } catch {
    return 'the reference script printed no figures';
  }
}

/** Runs the Seat balance cases and prints them under bench-dsp's other figures. */
export function printSeatBalanceBench(runs = 3): void {
  const fmtS = (ms: number) => (ms >= 1000 ? `${(ms / 1000).toFixed(2)} s` : `${ms.toFixed(1)} ms`);
  const t0 = performance.now();
  const { evaluator } = evaluatorFor(problem.subs);
  const setupMs = performance.now() - t0;
  const times: number[] = [];
  const maxEvaluations = searchEvaluations(problem.subs.length, problem.seats.length, evaluator.bandHz.length);
  let result = optimizeSubSettings({ evaluator, seed: 1, maxEvaluations });
  for (let k = 0; k < runs; k++) {
    const t = performance.now();
    result = optimizeSubSettings({ evaluator, seed: 1, maxEvaluations });
    times.push(performance.now() - t);
  }
  const oursMs = median(times);
  console.log(`  Seat balance, ${problem.subs.length} subs × ${problem.seats.length} seats, ${band.startHz}–${band.stopHz} Hz at 48 points/octave (${evaluator.bandHz.length} points), per-sub delay, gain, polarity:`);
  console.log(`    modal sums + evaluator set-up:                                ${fmtS(setupMs)}`);
  console.log(
    `    optimizeSubSettings (seed 1, the API's budget), median of ${runs}: ${fmtS(oursMs)}, ${result.evaluated} evaluations, ${((oursMs * 1000) / result.evaluated).toFixed(1)} µs each → ` +
      `mean spread ${result.before.objectiveDb.toFixed(3)} → ${result.after.objectiveDb.toFixed(3)} dB, level ${result.after.meanLevelDb.toFixed(2)} dB`,
  );

  const candidates = defaultSubCandidates(problem.room);
  const { transfers: candidateTransfers } = evaluatorFor(candidates.map((c) => c.positionM));
  let lastTenth = -1;
  const tp = performance.now();
  // The budgets POST /api/v1/seat-balance and the panel use for this size.
  const budget = placementEvaluations(4, problem.seats.length, evaluator.bandHz.length, 70);
  const placement = subPlacementSearch({
    frequencyHz: grid,
    candidateTransfers,
    count: 4,
    ...band,
    ...(budget ? { quickEvaluations: budget.quick, finalEvaluations: budget.final } : {}),
    onProgress: (done, total) => {
      const tenth = Math.floor((10 * done) / total);
      if (tenth === lastTenth) return;
      lastTenth = tenth;
      process.stderr.write(`    placement search: ${done}/${total} (${fmtS(performance.now() - tp)})\n`);
    },
  });
  const placementMs = performance.now() - tp;
  const top = placement.ranked[0];
  console.log(
    `    placement, 4 of ${candidates.length} default candidates (${placement.rankedCombinations} combinations, ${placement.ranked.length} re-optimised): ${fmtS(placementMs)}, ` +
      `${placement.evaluated} evaluations → best ${top ? `${top.candidates.map((c) => candidates[c]?.name).join(' + ')}: ${top.before.objectiveDb.toFixed(3)} → ${top.after.objectiveDb.toFixed(3)} dB` : 'none'}`,
  );

  const scipy = scipyFigures();
  if (typeof scipy === 'string') {
    console.log(`    scipy comparison skipped (${scipy})`);
    return;
  }
  const perEvalUs = (scipy.searchMs * 1000) / scipy.evaluations;
  console.log(
    `    scipy ${scipy.scipy} differential_evolution (seed 1, popsize ${scipy.popsize}, ${scipy.generations} of at most ${scipy.maxiter} generations, + Powell polish): ` +
      `${fmtS(scipy.searchMs)}, ${scipy.evaluations} evaluations, ` +
      `${perEvalUs.toFixed(1)} µs each (population evaluated at once); numpy modal sums ${fmtS(scipy.modalMs)}`,
  );
  console.log(
    `      side by side: time scipy / Seamline ${(scipy.searchMs / oursMs).toFixed(1)}×; objective Seamline ${result.after.objectiveDb.toFixed(3)} dB, scipy ${scipy.objectiveDb.toFixed(3)} dB ` +
      `(Seamline − scipy ${(result.after.objectiveDb - scipy.objectiveDb >= 0 ? '+' : '')}${(result.after.objectiveDb - scipy.objectiveDb).toFixed(3)} dB)`,
  );
}
