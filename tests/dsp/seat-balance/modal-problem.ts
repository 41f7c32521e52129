/**
 * Random Seat balance problems for the tests: a rectangular room, subs and seats anywhere inside it, and the modal
 * transfers (Kuttruff, "Room Acoustics", ch. 3, via dsp's modalTransfers) on a coarse log grid so property runs stay quick.
 */
import fc from 'fast-check';
import { logFrequencyGridHz, modalTransfers, seatBalanceEvaluator, type SeatBalanceEvaluator, type SeatTransfer } from '@/dsp';

export interface Point {
  x: number;
  y: number;
  z: number;
}

export interface ModalProblem {
  room: { lengthM: number; widthM: number; heightM: number };
  rt60S: number;
  subsM: Point[];
  seatsM: Point[];
}

/** 15–200 Hz at 12 points per octave: the 20–120 Hz band holds 32 points. */
export const COARSE_GRID_HZ = logFrequencyGridHz({ startHz: 15, stopHz: 200, pointsPerOctave: 12 });

const roomArb = fc.record({
  lengthM: fc.double({ min: 3.5, max: 9, noNaN: true }),
  widthM: fc.double({ min: 2.8, max: 7, noNaN: true }),
  heightM: fc.double({ min: 2.2, max: 3.4, noNaN: true }),
});

const pointIn = (room: ModalProblem['room']): fc.Arbitrary<Point> =>
  fc.record({ x: fc.double({ min: 0, max: room.widthM, noNaN: true }), y: fc.double({ min: 0, max: room.lengthM, noNaN: true }), z: fc.double({ min: 0, max: room.heightM, noNaN: true }) });

/** A room with `subs` (min…max) subs and `seats` (min…max) seats placed anywhere inside it. */
export function modalProblemArb(subs: { min: number; max: number }, seats: { min: number; max: number }): fc.Arbitrary<ModalProblem> {
  return roomArb.chain((room) =>
    fc.record({
      room: fc.constant(room),
      rt60S: fc.double({ min: 0.2, max: 0.8, noNaN: true }),
      subsM: fc.array(pointIn(room), { minLength: subs.min, maxLength: subs.max }),
      seatsM: fc.array(pointIn(room), { minLength: seats.min, maxLength: seats.max }),
    }),
  );
}

/** transfers[sub][seat] of the problem on `frequencyHz`. */
export function transfersOf(p: ModalProblem, frequencyHz: Float64Array = COARSE_GRID_HZ): SeatTransfer[][] {
  return modalTransfers({ room: p.room, sourcesM: p.subsM, receiversM: p.seatsM, frequencyHz, rt60S: p.rt60S, temperatureC: 20, maxModeHz: 300 }).transfers;
}

/** The evaluator of the problem over 20–120 Hz. */
export function evaluatorOf(p: ModalProblem, options: { maxOutputLossDb?: number; seatWeights?: number[] } = {}): SeatBalanceEvaluator {
  return seatBalanceEvaluator({ frequencyHz: COARSE_GRID_HZ, transfers: transfersOf(p), startHz: 20, stopHz: 120, ...options });
}

/**
 * An ordinary problem drawn uniformly (fast-check leans towards edge values, which the properties want; the reference
 * comparisons want rooms as people have them): a room 4–8 × 3–6 × 2.3–3 m, subs at least 0.2 m inside the walls and
 * seats in the back two thirds at ear height 0.9–1.3 m. A small xorshift generator, seeded.
 */
export function ordinaryProblem(seed: number, subs: number, seats: number): ModalProblem {
  let state = (seed * 2654435761) >>> 0 || 1;
  const next = () => {
    state ^= state << 13;
    state >>>= 0;
    state ^= state >>> 17;
    state ^= state << 5;
    state >>>= 0;
    return state / 4294967296;
  };
  const between = (lo: number, hi: number) => lo + (hi - lo) * next();
  const room = { lengthM: between(4, 8), widthM: between(3, 6), heightM: between(2.3, 3) };
  return {
    room,
    rt60S: between(0.25, 0.6),
    subsM: Array.from({ length: subs }, () => ({ x: between(0.2, room.widthM - 0.2), y: between(0.2, room.lengthM - 0.2), z: between(0.1, 0.5) })),
    seatsM: Array.from({ length: seats }, () => ({ x: between(0.5, room.widthM - 0.5), y: between(room.lengthM / 3, room.lengthM - 0.5), z: between(0.9, 1.3) })),
  };
}
