// Seamline dsp benchmark: prints medians, asserts nothing. Run: npx tsx scripts/bench-dsp.ts
// When python3 with scipy is present it times the same two-way blend through scipy.signal.freqs + numpy.
import { spawnSync } from 'node:child_process';
import { blendResponse, crossoverSweep, logFrequencyGridHz, modalTransfer, roomModes, type PathSpec } from '../dsp';

function medianUs(fn: () => void, warmup: number, runs: number): number {
  for (let k = 0; k < warmup; k++) fn();
  const t: number[] = [];
  for (let k = 0; k < runs; k++) {
    const t0 = process.hrtime.bigint();
    fn();
    t.push(Number(process.hrtime.bigint() - t0) / 1000);
  }
  t.sort((a, b) => a - b);
  return t[Math.floor(runs / 2)] as number;
}

const grid = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 48 });
const paths: PathSpec[] = [
  { name: 'mains', filter: { family: 'linkwitz-riley', order: 4, response: 'highpass', cornerHz: 80 }, gainDb: 0, delayMs: 0, invert: false },
  { name: 'sub', filter: { family: 'butterworth', order: 2, response: 'lowpass', cornerHz: 80 }, gainDb: 0, delayMs: 2.5, invert: true, distanceM: 3.4 },
];
let sink = 0;
const blendUs = medianUs(() => {
  const r = blendResponse({ temperatureC: 20, frequencyHz: grid, paths });
  sink += r.sum.groupDelayMs[100] as number;
}, 3000, 5000);

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
for _ in range(200): run()
t = []
for _ in range(2000):
    t0 = time.perf_counter(); run(); t.append((time.perf_counter()-t0)*1e6)
t.sort(); print(json.dumps({"medianUs": t[len(t)//2]}))
`;
let scipyUs: number | null = null;
const py = spawnSync('python3', ['-c', python], { encoding: 'utf8' });
if (py.status === 0) {
  try {
    scipyUs = (JSON.parse(py.stdout.trim()) as { medianUs: number }).medianUs;
  } catch {
    scipyUs = null;
  }
}

const candidatesHz = [40, 50, 60, 70, 80, 90, 100, 110, 120, 130, 140, 150];
const sweepUs = medianUs(() => {
  const r = crossoverSweep({
    temperatureC: 20,
    mainsRolloff: { kind: 'sealed', cornerHz: 55, q: 0.707 },
    subRolloff: { kind: 'lowpass', cornerHz: 200, q: 0.707 },
    mainsFilter: { family: 'linkwitz-riley', order: 4 },
    subFilter: { family: 'linkwitz-riley', order: 4 },
    candidatesHz,
  });
  sink += r.rows.length;
}, 3, 15);

const room = { lengthM: 6.4, widthM: 4.9, heightM: 2.7 };
const subs = [{ x: 0.3, y: 0.3, z: 0.3 }, { x: 4.6, y: 0.3, z: 0.3 }];
const seats = [1.5, 2.45, 3.4].flatMap((x) => [3.8, 4.8].map((y) => ({ x, y, z: 1.1 })));
const modalGrid = logFrequencyGridHz({ startHz: 15, stopHz: 300, pointsPerOctave: 500 / Math.log2(300 / 15) - 1e-9 }).subarray(0, 500);
const modesUs = medianUs(() => {
  const { modes } = roomModes({ ...room, maxHz: 300, temperatureC: 20 });
  sink += modes.length;
  for (const sourceM of subs) for (const receiverM of seats) {
    const r = modalTransfer({ room, sourceM, receiverM, frequencyHz: modalGrid, rt60S: 0.4, temperatureC: 20, maxModeHz: 300 });
    sink += r.magnitudeDb[10] as number;
  }
}, 3, 15);

const fmt = (us: number) => (us >= 1000 ? `${(us / 1000).toFixed(2)} ms` : `${us.toFixed(1)} µs`);
console.log('Seamline dsp bench (medians; targets from issue 3 are printed, never asserted)');
console.log(`  two-way blend, ${grid.length} points (LR4 HP + BW2 LP, delay, distance, inverted sub): ${fmt(blendUs)}   target ≤ 40 µs`);
if (scipyUs !== null) {
  console.log(`  same workload, scipy.signal.freqs + numpy:                              ${fmt(scipyUs)}   ratio ${(scipyUs / blendUs).toFixed(1)}× (target ≥ 7×)`);
} else {
  console.log('  scipy comparison skipped (python3 with scipy not found)');
}
console.log(`  crossover sweep, ${candidatesHz.length} candidates, delay ±20 ms + polarity search:        ${fmt(sweepUs)}   target ≤ 20 ms`);
console.log(`  room modes to 300 Hz + modal sums 2 subs × 6 seats × ${modalGrid.length} frequencies:    ${fmt(modesUs)}   target ≤ 20 ms`);
if (!Number.isFinite(sink)) console.log('(sink)', sink);
