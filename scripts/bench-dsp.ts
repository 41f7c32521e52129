// Seamline dsp benchmark: prints medians, asserts nothing. Run: npm run bench:dsp (= npx tsx scripts/bench-dsp.ts).
// Every figure is the median wall time of many timed calls after a warm-up, with the CPU time per call beside it
// (process.cpuUsage over the same calls; on a shared machine it excludes time spent waiting for a core). The same measurements run twice: under tsx (this
// process) and, when esbuild is installed, as one bundled ES module under plain node (how production code runs).
// When python3 with scipy is present, the same two-way blend is timed through scipy.signal.freqs + numpy.
// Seat balance (scripts/lib/seat-balance-bench.ts) runs last, under tsx only: its searches take seconds, not µs.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { loadavg, tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import {
  blendGrid,
  blendResponse,
  blendSumResponse,
  crossoverSweep,
  groupTimingAdvice,
  logFrequencyGridHz,
  modalTransfer,
  modalTransfers,
  roomModes,
  subTimingAdvice,
  type PathSpec,
  type SystemModel,
  type SystemSource,
  type ResponseCurves,
} from '../dsp';
import { printEqDesignBench } from './lib/eq-design-bench';
import { printSeatBalanceBench } from './lib/seat-balance-bench';

interface Figures {
  blendAll: Timing;
  blendSum: Timing;
  blendSumPrepared: Timing;
  sweep: Timing;
  sweepTwoSubs: Timing;
  subAdvice: Timing;
  groupAdvice: Timing;
  modesBatch: Timing;
  modesPairwise: Timing;
}

/** Median wall time per call, µs, and CPU time per call over the timed runs (process.cpuUsage), µs. */
interface Timing {
  medianUs: number;
  cpuUs: number;
}

function time(fn: () => void, warmup: number, runs: number): Timing {
  for (let k = 0; k < warmup; k++) fn();
  const t: number[] = [];
  const cpu0 = process.cpuUsage();
  for (let k = 0; k < runs; k++) {
    const t0 = process.hrtime.bigint();
    fn();
    t.push(Number(process.hrtime.bigint() - t0) / 1000);
  }
  const cpu = process.cpuUsage(cpu0);
  t.sort((a, b) => a - b);
  return { medianUs: t[Math.floor(runs / 2)] as number, cpuUs: (cpu.user + cpu.system) / runs };
}

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 48 });
const paths: PathSpec[] = [
  { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false },
  { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
];
const candidatesHz = [40, 50, 60, 70, 80, 90, 100, 110, 120, 130, 140, 150];
const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
const subs = [{ x: 0.3, y: 0.3, z: 0.3 }, { x: 4.6, y: 0.3, z: 0.3 }];
const seats = [1.5, 2.45, 3.4].flatMap((x) => [3.8, 4.8].map((y) => ({ x, y, z: 1.1 })));
const modalGrid = logFrequencyGridHz({ startHz: 15, stopHz: 300, pointsPerOctave: 500 / Math.log2(300 / 15) - 1e-9 }).subarray(0, 500);

function measure(): Figures {
  let sink = 0;
  // What the blend route does on every slider move: all curves of every path and of the sum.
  const blendAll = time(() => {
    sink += blendResponse({ temperatureC: 20, frequencyHz: grid, paths }).sum.groupDelayMs[100] as number;
  }, 3000, 5000);
  // Only the sum (magnitude, phase, unwrapped phase, group delay), grid passed as a plain array.
  const blendSum = time(() => {
    sink += blendSumResponse({ temperatureC: 20, frequencyHz: grid, paths }).sum.groupDelayMs[100] as number;
  }, 3000, 10000);
  // Only the sum with the grid prepared once (validated, ω precomputed) and the output curves reused.
  const prepared = blendGrid(grid);
  const n = grid.length;
  const into: ResponseCurves = { magnitudeDb: new Float64Array(n), phaseDeg: new Float64Array(n), unwrappedPhaseDeg: new Float64Array(n), groupDelayMs: new Float64Array(n) };
  const blendSumPrepared = time(() => {
    sink += blendSumResponse({ temperatureC: 20, frequencyHz: prepared, paths, into }).sum.groupDelayMs[100] as number;
  }, 3000, 10000);
  // The whole system: one main and one sub (as the sweep before the whole-system model), then two subs.
  const lr4 = { family: 'linkwitz-riley', order: 4 } as const;
  const sub = (name: string, distanceM: number): SystemSource => ({ name, distanceM, delayMs: 0, gainDb: 0, invert: false, rolloff: { kind: 'lowpass', cornerHz: 200, q: 0.707 } });
  const oneSub: SystemModel = {
    temperatureC: 20,
    crossoverHz: 80,
    mainsHighpass: lr4,
    subLowpass: lr4,
    mains: { name: 'L', distanceM: 3, delayMs: 0, gainDb: 0, invert: false, rolloff: { kind: 'sealed', cornerHz: 55, q: 0.707 } },
    subs: [sub('sub', 3.6)],
  };
  const twoSubs: SystemModel = { ...oneSub, subs: [sub('front', 3.6), sub('back', 4.4)] };
  const sweep = time(() => {
    sink += crossoverSweep({ model: oneSub, pairings: [{ mainsFilter: lr4, subFilter: lr4 }], candidatesHz }).rows.length;
  }, 5, 41);
  const sweepTwoSubs = time(() => {
    sink += crossoverSweep({ model: twoSubs, pairings: [{ mainsFilter: lr4, subFilter: lr4 }], candidatesHz }).rows.length;
  }, 5, 41);
  const subAdvice = time(() => {
    sink += subTimingAdvice(twoSubs, 0).after.flatnessDb;
  }, 5, 41);
  const groupAdvice = time(() => {
    sink += groupTimingAdvice(twoSubs).after.flatnessDb;
  }, 5, 41);
  const modesBatch = time(() => {
    const { modes } = roomModes({ ...room, maxHz: 300, temperatureC: 20 });
    sink += modes.length;
    const r = modalTransfers({ room, sourcesM: subs, receiversM: seats, frequencyHz: modalGrid, rt60S: 0.4, temperatureC: 20, maxModeHz: 300 });
    sink += r.transfers[1]![5]!.magnitudeDb[10] as number;
  }, 5, 41);
  const modesPairwise = time(() => {
    const { modes } = roomModes({ ...room, maxHz: 300, temperatureC: 20 });
    sink += modes.length;
    for (const sourceM of subs) for (const receiverM of seats) {
      const r = modalTransfer({ room, sourceM, receiverM, frequencyHz: modalGrid, rt60S: 0.4, temperatureC: 20, maxModeHz: 300 });
      sink += r.magnitudeDb[10] as number;
    }
  }, 5, 41);
  if (!Number.isFinite(sink)) console.log('(sink)', sink);
  return { blendAll, blendSum, blendSumPrepared, sweep, sweepTwoSubs, subAdvice, groupAdvice, modesBatch, modesPairwise };
}

// scipy: each path from signal.freqs, the sum's magnitude, phase and group delay (from the polynomial derivatives),
// like blendSumResponse; the polynomials are built once outside the timed call.
const python = `
import time, json, numpy as np
from scipy import signal
f = 10.0 * 2.0 ** (np.arange(${grid.length}) / 48); w = 2*np.pi*f
bh, ah = signal.butter(2, 2*np.pi*80, 'high', analog=True); bh, ah = np.polymul(bh, bh), np.polymul(ah, ah)
bl, al = signal.butter(2, 2*np.pi*80, 'low', analog=True)
tau = 0.0025 + 3.4 / (331.3*np.sqrt(1+20/273.15)); s = 1j*w
dbh, dah, dbl, dal = np.polyder(bh), np.polyder(ah), np.polyder(bl), np.polyder(al)
def run():
    _, hm = signal.freqs(bh, ah, worN=w)
    _, hs = signal.freqs(bl, al, worN=w)
    hs = -hs * np.exp(-1j*w*tau)
    dm = 1j*(np.polyval(dbh, s)/np.polyval(bh, s) - np.polyval(dah, s)/np.polyval(ah, s))
    ds = 1j*(np.polyval(dbl, s)/np.polyval(bl, s) - np.polyval(dal, s)/np.polyval(al, s)) - 1j*tau
    h = hm + hs
    mag = 20*np.log10(np.abs(h)); ph = np.angle(h, deg=True); gd = -np.imag((hm*dm + hs*ds)/h)*1000
    return mag, ph, gd
for _ in range(300): run()
t = []
c0 = time.process_time()
for _ in range(3000):
    t0 = time.perf_counter(); run(); t.append((time.perf_counter()-t0)*1e6)
c = (time.process_time() - c0) / 3000 * 1e6
t.sort(); print(json.dumps({"medianUs": t[len(t)//2], "cpuUs": c}))
`;

function scipyTiming(): Timing | null {
  const py = spawnSync('python3', ['-c', python], { encoding: 'utf8' });
  if (py.status !== 0) return null;
  try {
    return JSON.parse(py.stdout.trim()) as Timing;
  } catch {
    return null;
  }
}

/** Bundles this script with esbuild and runs the bundle under node; null when esbuild is missing or fails. */
function measureBundled(): Figures | null {
  const self = fileURLToPath(import.meta.url);
  const esbuild = join(self, '..', '..', 'node_modules', '.bin', 'esbuild');
  if (!existsSync(esbuild)) return null;
  const dir = mkdtempSync(join(tmpdir(), 'seamline-bench-'));
  try {
    const out = join(dir, 'bench.mjs');
    const build = spawnSync(esbuild, [self, '--bundle', '--platform=node', '--format=esm', `--outfile=${out}`, '--log-level=error'], { encoding: 'utf8' });
    if (build.status !== 0) return null;
    const run = spawnSync(process.execPath, [out], { encoding: 'utf8', env: { ...process.env, SEAMLINE_BENCH_CHILD: '1' } });
    if (run.status !== 0) return null;
    return JSON.parse(run.stdout.trim().split('\n').pop() as string) as Figures;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

if (process.env.SEAMLINE_BENCH_CHILD === '1') {
  console.log(JSON.stringify(measure()));
} else {
  const load = loadavg().map((v) => v.toFixed(1)).join(' ');
  const tsx = measure();
  const bundled = measureBundled();
  const scipy = scipyTiming();
  const fmt = (us: number) => (us >= 1000 ? `${(us / 1000).toFixed(2)} ms` : `${us.toFixed(1)} µs`);
  const one = (t: Timing) => `${fmt(t.medianUs).padStart(9)} (cpu ${fmt(t.cpuUs)})`;
  const cell = (pick: (f: Figures) => Timing) => `${one(pick(tsx))} tsx${bundled ? ` ${one(pick(bundled))} bundled` : ''}`;
  console.log(`Seamline dsp bench (medians; targets from issue 3 are printed, never asserted; load average ${load} on ${process.platform}, node ${process.version})`);
  console.log(`  two-way blend, ${grid.length} points (LR4 HP + BW2 LP, delay, distance, inverted sub):`);
  console.log(`    blendResponse, every path and the sum (the blend route):      ${cell((f) => f.blendAll)}`);
  console.log(`    blendSumResponse, the sum only (grid as an array):           ${cell((f) => f.blendSum)}`);
  console.log(`    blendSumResponse, the sum only (blendGrid + into):           ${cell((f) => f.blendSumPrepared)}   target ≤ 40 µs`);
  if (scipy !== null) {
    const best = Math.min(tsx.blendSumPrepared.medianUs, bundled?.blendSumPrepared.medianUs ?? Infinity);
    const plain = Math.min(tsx.blendSum.medianUs, bundled?.blendSum.medianUs ?? Infinity);
    const bestCpu = Math.min(tsx.blendSumPrepared.cpuUs, bundled?.blendSumPrepared.cpuUs ?? Infinity);
    console.log(`    same workload, scipy.signal.freqs + numpy (sum's magnitude, phase, group delay): ${one(scipy)}`);
    console.log(`      ratio scipy / Seamline (medians): ${(scipy.medianUs / best).toFixed(1)}× (blendGrid + into), ${(scipy.medianUs / plain).toFixed(1)}× (array grid); cpu ${(scipy.cpuUs / bestCpu).toFixed(1)}×   target ≥ 7×`);
  } else {
    console.log('    scipy comparison skipped (python3 with scipy not found)');
  }
  console.log(`  crossover sweep on the whole system, ${candidatesHz.length} candidates, each at its best sub shift ±20 ms + polarity, every proposal assessed:`);
  console.log(`    one main + one sub:                                           ${cell((f) => f.sweep)}   target ≤ 20 ms`);
  console.log(`    one main + two subs:                                          ${cell((f) => f.sweepTwoSubs)}`);
  console.log(`  Timing advice, one main + two subs (scan ±20 ms, both polarities, assessed):`);
  console.log(`    one sub against the rest (with the flatness-vs-delay curve):  ${cell((f) => f.subAdvice)}`);
  console.log(`    all subs (coordinate descent, ≤ 4 rounds):                    ${cell((f) => f.groupAdvice)}`);
  console.log(`  room modes to 300 Hz + modal sums, 2 subs × 6 seats × ${modalGrid.length} frequencies:`);
  console.log(`    roomModes + modalTransfers (all pairs in one call):           ${cell((f) => f.modesBatch)}   target ≤ 20 ms`);
  console.log(`    roomModes + 12 × modalTransfer:                               ${cell((f) => f.modesPairwise)}`);
  if (!bundled) console.log('  (bundled run skipped: node_modules/.bin/esbuild not found or failed)');
  printEqDesignBench();
  printSeatBalanceBench();
}
