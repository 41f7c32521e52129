// Shapes shared by the Seat balance files: one sub's processor setting, the search limits, the measures of a setting.

/** What the processor does to one sub: a delay, a level change and a polarity. */
export interface SubSetting {
  /** Processor delay, ms ≥ 0. */
  readonly delayMs: number;
  /** Level change, dB. */
  readonly gainDb: number;
  readonly invert: boolean;
}

/** The box the search stays in. */
export interface SeatBalanceLimits {
  /** Largest delay of any sub, ms (delays run 0…maxDelayMs). */
  readonly maxDelayMs: number;
  readonly minGainDb: number;
  readonly maxGainDb: number;
  /** Whether a sub's polarity may be inverted. */
  readonly allowInvert: boolean;
  /**
   * Output floor: the seats' mean level in the band may fall at most this far below every sub in phase at 0 ms / 0 dB,
   * dB ≥ 0.
   */
  readonly maxOutputLossDb: number;
}

/** Defaults of the limits (issue 15: 0…20 ms, −12…+6 dB, inversion allowed, at most 3 dB below the in-phase level). */
export const SEAT_BALANCE_DEFAULT_LIMITS: SeatBalanceLimits = { maxDelayMs: 20, minGainDb: -12, maxGainDb: 6, allowInvert: true, maxOutputLossDb: 3 };

/** Steps the answer's settings are rounded to before they are measured (a processor's usual resolution). */
export const SEAT_BALANCE_RESOLUTION = { delayMs: 0.01, gainDb: 0.1 } as const;

/** How well one set of sub settings serves the seats, over the band. */
export interface SeatBalanceMeasures {
  /** Mean over the band of (loudest − quietest seat) at each frequency, dB: room-response's meanSpreadDb. */
  readonly meanSpreadDb: number;
  /** Largest seat-to-seat spread in the band, dB, and where. */
  readonly maxSpreadDb: number;
  readonly maxSpreadHz: number;
  /**
   * The seats' mean level over the band (power mean over seats, weighted, and frequencies), dB relative to every sub
   * in phase at 0 ms / 0 dB (which reads 0).
   */
  readonly meanLevelDb: number;
  /** What the search minimises: meanSpreadDb, or its weighted form when the seats have unequal weights, dB. */
  readonly objectiveDb: number;
  /** True when the output floor holds (meanLevelDb ≥ −maxOutputLossDb). */
  readonly withinFloor: boolean;
}
