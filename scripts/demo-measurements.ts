/**
 * Invented measured files for the invented "Juniper Lane screening room" (README, "Demo data"), generated from
 * the model: each speaker's natural roll-off and air path to the seat (dsp), a seat-specific room
 * ripple taken from the modal sum at that seat (dsp summedModalResponse, as a minimum-phase
 * deviation below ~300 Hz), and seeded noise. Deterministic: the same seed gives the same bytes.
 * Not a real measurement of anything; every file says so in its first line.
 *
 *   npx tsx scripts/demo-measurements.ts [out-dir]   writes the files (default: print a summary)
 */
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  arrivalTimeMs,
  logFrequencyGridHz,
  minimumPhaseDeg,
  pathResponse,
  rolloffResponse,
  smoothFractionalOctave,
  summedModalResponse,
  unwrapDeg,
  type PointM,
  type RolloffSpec,
} from '../dsp';
import { juniperLaneDocument } from '../lib/demo/systems';
import { voicingFilters } from '../lib/system-model/voicing';
import type { Seat, SystemDocument } from '../lib/validations/system';

export interface DemoMeasurementFile {
  /** File name, e.g. `juniper-lane-mlp-mains.csv`. */
  fileName: string;
  name: string;
  seat: string;
  /** 'mains', 'sub' (both subs together), or one sub's name (that sub alone, for Seat balance). */
  role: string;
  hasPhase: boolean;
  /** What was different in this run (a voicing switch's position); absent for the single runs. */
  runLabel?: string;
  text: string;
}

/** mulberry32: a small seeded generator (public domain), uniform in [0, 1). */
function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Roughly normal noise (sum of four uniforms, unit variance). */
const gaussian = (rand: () => number) => (rand() + rand() + rand() + rand() - 2) * Math.sqrt(3);

const toPoint = (p: { xM: number; yM: number; zM: number }): PointM => ({ x: p.xM, y: p.yM, z: p.zM });

/** Room ripple at a seat: the modal sum's deviation from its own octave-smoothed trend, faded out from 150 to 400 Hz. */
function roomRippleDb(doc: SystemDocument, sources: PointM[], seat: Seat, grid: Float64Array, depth: number): Float64Array {
  const { lengthM, widthM, heightM, rt60S, temperatureC } = doc.room;
  const modal = summedModalResponse({
    room: { lengthM, widthM, heightM },
    sources: sources.map((positionM) => ({ positionM })),
    receiverM: toPoint(seat),
    frequencyHz: grid,
    rt60S,
    temperatureC,
    maxModeHz: 500,
  });
  const trend = smoothFractionalOctave({ frequencyHz: grid, magnitudeDb: modal.sum.magnitudeDb, fraction: 1 }).magnitudeDb;
  return Float64Array.from(grid, (f, i) => {
    const w = f <= 150 ? 1 : f >= 400 ? 0 : Math.log(400 / f) / Math.log(400 / 150);
    const d = (modal.sum.magnitudeDb[i]! - trend[i]!) * depth * w;
    return Math.max(-15, Math.min(12, d));
  });
}

function curveText(header: string[], grid: Float64Array, magnitudeDb: Float64Array, phaseDeg: Float64Array | null): string {
  const lines = [...header.map((h) => `# ${h}`), phaseDeg ? 'Frequency (Hz),Magnitude (dB),Phase (deg)' : 'Frequency (Hz),Magnitude (dB)'];
  grid.forEach((f, i) => {
    const cells = [Number(f.toPrecision(6)), magnitudeDb[i]!.toFixed(3)];
    if (phaseDeg) cells.push(phaseDeg[i]!.toFixed(2));
    lines.push(cells.join(','));
  });
  return `${lines.join('\n')}\n`;
}

interface SourceModel {
  positionsM: PointM[];
  rolloff: RolloffSpec[];
  /** Level of the invented speaker at the seat, dB (arbitrary reference). */
  levelDb: number;
  rippleDepth: number;
}

function measuredCurve(doc: SystemDocument, seat: Seat, model: SourceModel, grid: Float64Array, rand: () => number, withPhase: boolean) {
  const speaker = rolloffResponse({ rolloff: model.rolloff, frequencyHz: grid });
  const ripple = roomRippleDb(doc, model.positionsM, seat, grid, model.rippleDepth);
  const ripplePhase = minimumPhaseDeg({ frequencyHz: grid, magnitudeDb: ripple }).unwrappedPhaseDeg;
  // The nearest source's air path: the time of flight a measurement with phase holds.
  const distanceM = Math.min(...model.positionsM.map((p) => Math.hypot(p.x - seat.xM, p.y - seat.yM, p.z - seat.zM)));
  const delayMs = arrivalTimeMs({ distanceM, temperatureC: doc.room.temperatureC });
  const speakerPhase = unwrapDeg(speaker.phaseDeg);
  const magnitudeDb = Float64Array.from(grid, (_f, i) => model.levelDb + speaker.magnitudeDb[i]! + ripple[i]! + 0.25 * gaussian(rand));
  const phaseDeg = Float64Array.from(grid, (f, i) => {
    const p = speakerPhase[i]! + ripplePhase[i]! - 0.36 * f * delayMs + 1.5 * gaussian(rand);
    return p - 360 * Math.round(p / 360);
  });
  return { magnitudeDb, phaseDeg: withPhase ? phaseDeg : null, distanceM };
}

/**
 * The invented files: per seat of the Juniper Lane room, the left main speaker alone and both subs
 * together, measured from 10 Hz, then each sub alone at each seat with phase (for Seat balance). The left seat's pair has no phase column (a magnitude-only
 * measurement), so the Measured panel shows its estimated phase.
 */
export function demoMeasurementFiles(seed = 20261201): DemoMeasurementFile[] {
  const doc = juniperLaneDocument();
  const rand = seeded(seed);
  const left = doc.speakers.find((s) => s.channel === 'L')!;
  const mainProfile = doc.profiles.find((p) => p.id === left.profileId)!;
  const subProfile = doc.profiles.find((p) => p.id === doc.subs[0]!.profileId)!;
  const mains: SourceModel = { positionsM: [toPoint(left)], rolloff: [mainProfile.lowRolloff], levelDb: 84, rippleDepth: 0.5 };
  const subs: SourceModel = { positionsM: doc.subs.map(toPoint), rolloff: [subProfile.lowRolloff, subProfile.highRolloff], levelDb: 87, rippleDepth: 0.8 };
  const mainsGrid = logFrequencyGridHz({ startHz: 10, stopHz: 20000, pointsPerOctave: 24 });
  const subGrid = logFrequencyGridHz({ startHz: 10, stopHz: 500, pointsPerOctave: 48 });
  const files: DemoMeasurementFile[] = [];
  for (const seat of doc.seats) {
    const withPhase = seat.id !== 'left';
    for (const [role, model, grid] of [['mains', mains, mainsGrid], ['sub', subs, subGrid]] as const) {
      const c = measuredCurve(doc, seat, model, grid, rand, withPhase);
      const what = role === 'mains' ? 'L main speaker alone' : 'both subs together';
      const name = `${seat.name}: ${role === 'mains' ? 'L mains' : 'subs'} (invented)`;
      files.push({
        fileName: `juniper-lane-${seat.id}-${role}${withPhase ? '' : '-no-phase'}.csv`,
        name,
        seat: seat.name,
        role,
        hasPhase: withPhase,
        text: curveText(
          [
            'Invented demo data, not a real measurement: generated by Seamline from its own model.',
            `Juniper Lane screening room (invented), ${seat.name}, ${what}, no processing.`,
            `Nearest source ${c.distanceM.toFixed(2)} m away; room ripple from the modal sum at this seat; seeded noise.`,
          ],
          grid,
          c.magnitudeDb,
          c.phaseDeg,
        ),
      });
    }
  }
  files.push(...singleSubFiles(doc, subGrid, rand));
  // A generator of its own, so the files above keep their bytes.
  files.push(...switchRunFiles(doc, mainsGrid, seeded(seed + 17)));
  return files;
}

/**
 * The centre speaker measured at the MLP twice, its invented Placement switch in each position ("Free-standing", flat;
 * "Near a wall", the profile's −3 dB low shelf at 150 Hz), each made from the model with that position's EQ
 * (voicingFilters, the filters the one model runs), the same room ripple and independent seeded noise: two runs whose
 * difference is the switch's shelf. Role "C", so they fill the C column of the Measured tab's table.
 */
function switchRunFiles(doc: SystemDocument, grid: Float64Array, rand: () => number): DemoMeasurementFile[] {
  const centre = doc.speakers.find((s) => s.channel === 'C')!;
  const seat = doc.seats.find((s) => s.id === doc.mlpSeatId)!;
  const profile = doc.profiles.find((p) => p.id === centre.profileId)!;
  const option = profile.voicingOptions.find((o) => o.id === 'placement')!;
  const position = toPoint(centre);
  const distanceM = Math.hypot(position.x - seat.xM, position.y - seat.yM, position.z - seat.zM);
  const ripple = roomRippleDb(doc, [position], seat, grid, 0.5);
  const ripplePhase = minimumPhaseDeg({ frequencyHz: grid, magnitudeDb: ripple }).unwrappedPhaseDeg;
  return option.positions.map((pos) => {
    const path = pathResponse(
      { name: 'C', filter: { family: 'butterworth', order: 2, response: 'none', cornerHz: 80 }, rolloff: [profile.lowRolloff], eq: voicingFilters(profile, { [option.id]: pos.id }), gainDb: 0, delayMs: 0, invert: false, distanceM },
      grid,
      doc.room.temperatureC,
    );
    const magnitudeDb = Float64Array.from(grid, (_f, i) => 84 + path.magnitudeDb[i]! + ripple[i]! + 0.25 * gaussian(rand));
    const phaseDeg = Float64Array.from(grid, (_f, i) => {
      const p = (Math.atan2(path.im[i]!, path.re[i]!) * 180) / Math.PI + ripplePhase[i]! + 1.5 * gaussian(rand);
      return p - 360 * Math.round(p / 360);
    });
    const runLabel = `${option.name}: ${pos.name}`;
    return {
      fileName: `juniper-lane-${seat.id}-c-${option.id}-${pos.id}.csv`,
      name: `${seat.name}: C, ${option.name.toLowerCase()} ${pos.name.toLowerCase()} (invented)`,
      seat: seat.name,
      role: 'C',
      hasPhase: true,
      runLabel,
      text: curveText(
        [
          'Invented demo data, not a real measurement: generated by Seamline from its own model.',
          `Juniper Lane screening room (invented), ${seat.name}, C main speaker alone, its ${option.name} switch at "${pos.name}", no processing.`,
          `${distanceM.toFixed(2)} m away; room ripple from the modal sum at this seat; seeded noise.`,
        ],
        grid,
        magnitudeDb,
        phaseDeg,
      ),
    };
  });
}

/**
 * Each sub alone at each seat, with its true phase (the modal sum's complex transfer times the sub's roll-off, one
 * timing reference for every file): what Seat balance needs from measurements. Role = the sub's name.
 */
function singleSubFiles(doc: SystemDocument, grid: Float64Array, rand: () => number): DemoMeasurementFile[] {
  const profile = doc.profiles.find((p) => p.id === doc.subs[0]!.profileId)!;
  const rolloff = rolloffResponse({ rolloff: [profile.lowRolloff, profile.highRolloff], frequencyHz: grid });
  const rolloffPhase = unwrapDeg(rolloff.phaseDeg);
  const { lengthM, widthM, heightM, rt60S, temperatureC } = doc.room;
  const files: DemoMeasurementFile[] = [];
  let offsetDb: number | null = null;
  for (const seat of doc.seats) {
    const modal = summedModalResponse({ room: { lengthM, widthM, heightM }, sources: doc.subs.map((s) => ({ positionM: toPoint(s) })), receiverM: toPoint(seat), frequencyHz: grid, rt60S, temperatureC, maxModeHz: 750 });
    // One offset for every file, so the levels read like a sub at about 87 dB while keeping their differences.
    offsetDb ??= 87 - modal.perSource[0]!.magnitudeDb[Math.round(grid.length / 3)]!;
    doc.subs.forEach((sub, s) => {
      const p = modal.perSource[s]!;
      const magnitudeDb = Float64Array.from(grid, (_f, i) => p.magnitudeDb[i]! + offsetDb! + rolloff.magnitudeDb[i]! + 0.2 * gaussian(rand));
      const phaseDeg = Float64Array.from(grid, (_f, i) => {
        const v = (Math.atan2(p.im[i]!, p.re[i]!) * 180) / Math.PI + rolloffPhase[i]! + gaussian(rand);
        return v - 360 * Math.round(v / 360);
      });
      const slug = sub.name.toLowerCase().replace(/[^a-z0-9]+/g, '-');
      files.push({
        fileName: `juniper-lane-${seat.id}-${slug}.csv`,
        name: `${seat.name}: ${sub.name} alone (invented)`,
        seat: seat.name,
        role: sub.name,
        hasPhase: true,
        text: curveText(
          [
            'Invented demo data, not a real measurement: generated by Seamline from its own model.',
            `Juniper Lane screening room (invented), ${seat.name}, ${sub.name} alone, no processing, one timing reference for every file.`,
            'Modal sum at this seat with its true phase; seeded noise.',
          ],
          grid,
          magnitudeDb,
          phaseDeg,
        ),
      });
    });
  }
  return files;
}

if (process.argv[1] && /demo-measurements\.ts$/.test(process.argv[1])) {
  const out = process.argv[2];
  const files = demoMeasurementFiles();
  for (const f of files) {
    if (out) {
      mkdirSync(out, { recursive: true });
      writeFileSync(join(out, f.fileName), f.text);
    }
    console.log(`${f.fileName}  ${f.text.length} bytes  ${f.name}`);
  }
}
