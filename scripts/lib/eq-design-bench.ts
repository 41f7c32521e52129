// EQ designer figures for npm run bench:dsp (scripts/bench-dsp.ts): prints, asserts nothing. Issue 16's case: 5 peaking
// filters on 20–120 Hz at 48 points per octave, on the modal model of the invented Juniper Lane room (fictional; the
// demo's two front-corner subs through an LR4 low-pass at 80 Hz, 48 kHz) at the MLP and averaged over its three seats,
// and on seeded synthetic responses (random peaks, dips and a tilt). Median wall time and CPU time per design, in ms.
import { designEq } from '../../dsp';
import { seededRandom } from '../../dsp/internal/seeded-random';
import { eqDesignModelCurve } from '../../lib/system-model/eq-design';
import { eqDesignModelRequestSchema } from '../../lib/validations/compute-eq-design';

const ROOM = { lengthM: 6.4, widthM: 4.9, heightM: 2.7, rt60S: 0.4, temperatureC: 20 };
const SEATS = [
  { name: 'Row 1 left', xM: 1.75, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 centre', xM: 2.45, yM: 3.7, zM: 1.1 },
  { name: 'Row 1 right', xM: 3.15, yM: 3.7, zM: 1.1 },
];
const rolloffs = [{ kind: 'vented', cornerHz: 22 }, { kind: 'lowpass', cornerHz: 160, q: 0.7 }];
const SUBS = [
  { name: 'Sub front left', xM: 0.3, yM: 0.3, zM: 0.3, rolloffs },
  { name: 'Sub front right', xM: 4.6, yM: 0.3, zM: 0.3, rolloffs, delayMs: 0.4 },
];

/** A synthetic response: a tilt plus six resonances and dips of random centre, height and width (dB). */
function synthetic(frequencyHz: Float64Array, seed: number): Float64Array {
  const random = seededRandom(seed);
  const tiltDbPerOctave = 6 * random() - 3;
  const bumps = Array.from({ length: 6 }, () => ({ hz: 20 * Math.pow(6, random()), db: 24 * random() - 12, octaves: 0.05 + 0.4 * random() }));
  return frequencyHz.map((f) => tiltDbPerOctave * Math.log2(f / 50) + bumps.reduce((s, b) => s + b.db * Math.exp(-0.5 * (Math.log2(f / b.hz) / b.octaves) ** 2), 0));
}

interface Case {
  name: string;
  frequencyHz: Float64Array;
  magnitudeDb: Float64Array;
  targetShapeDb?: Float64Array;
}

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)] as number;
}

/** Runs the EQ design cases and prints them under bench-dsp's other figures. */
export function printEqDesignBench(warmup = 5, runs = 21): void {
  const model = (at: string) => eqDesignModelCurve(eqDesignModelRequestSchema.parse({ room: ROOM, seats: SEATS, subs: SUBS, at, lowpass: { family: 'linkwitz-riley', order: 4, cornerHz: 80 } }));
  const mlp = model('Row 1 centre');
  const cases: Case[] = [
    { name: 'model of the invented Juniper Lane room at the MLP', ...mlp },
    { name: 'the same room, power average of its 3 seats', ...model('average') },
    ...[1, 2, 3].map((seed) => ({ name: `synthetic response, seed ${seed}`, frequencyHz: mlp.frequencyHz, magnitudeDb: synthetic(mlp.frequencyHz, seed) })),
  ];
  const bandPoints = Array.from(mlp.frequencyHz).filter((f) => f >= 20 && f <= 120).length;
  console.log(`  EQ design, at most 5 peaking filters on 20–120 Hz at 48 points/octave (${bandPoints} band points), median of ${runs} after ${warmup} warm-up runs:`);
  const medians: number[] = [];
  for (const c of cases) {
    const design = () => designEq({ frequencyHz: c.frequencyHz, magnitudeDb: c.magnitudeDb, ...(c.targetShapeDb ? { targetShapeDb: c.targetShapeDb } : {}), maxFilters: 5 });
    for (let k = 0; k < warmup; k++) design();
    const wall: number[] = [];
    const cpu: number[] = [];
    let last = design();
    for (let k = 0; k < runs; k++) {
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      last = design();
      wall.push(performance.now() - t0);
      const used = process.cpuUsage(c0);
      cpu.push((used.user + used.system) / 1000);
    }
    medians.push(median(wall));
    const r = last.residual;
    console.log(
      `    ${`${c.name}:`.padEnd(62)} ${median(wall).toFixed(1)} ms (cpu ${median(cpu).toFixed(1)} ms); ${last.filters.length} filters, ` +
        `RMS ${r.before.rmsDb.toFixed(2)} → ${r.after.rmsDb.toFixed(2)} dB, ${last.nulls.length} null${last.nulls.length === 1 ? '' : 's'} left alone`,
    );
  }
  console.log(`    slowest median: ${Math.max(...medians).toFixed(1)} ms   target ≤ 50 ms`);
}
