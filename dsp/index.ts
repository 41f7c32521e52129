// Seamline's mathematics: pure TypeScript, no I/O. This file only re-exports.

export { speedOfSoundMps } from './air/speed-of-sound';
export { arrivalTimeMs } from './air/arrival-time';

export { logFrequencyGridHz } from './grid/log-frequency-grid';
export { fractionalOctaveBands, OCTAVE_RATIO_BASE_TEN } from './grid/fractional-octave-bands';
export { nominalMidbandHz } from './grid/nominal-midband-frequency';

export type { FilterFamily, FilterSpec, FilterShape, RolloffSpec, RolloffChain, AnalogSection } from './filters/filter-types';
export { butterworthQ } from './filters/butterworth-q';
export { filterSections, rolloffSections } from './filters/analog-sections';
export { filterResponse, rolloffResponse, secondOrderSectionResponse } from './filters/filter-response';
export { BIQUAD_CONVENTION, type Biquad, type EqFilter, type AllpassFilter, type CrossoverFilter, type ProcessorFilter } from './filters/filter-types';
export { eqSection, eqSections, EQ_LIMITS } from './filters/eq-sections';
export { SAMPLE_RATE_LIMITS_HZ, COMMON_SAMPLE_RATES_HZ } from './filters/sample-rate';
export { analogSectionToBiquad, crossoverBiquads } from './filters/bilinear-transform';
export { eqBiquad, allpassBiquad } from './filters/cookbook-biquads';
export { biquadsResponse, isStableBiquad } from './filters/biquad-response';
export { processorFilters, processorFilterBiquads, MAX_PROCESSOR_FILTERS, DEVIATION_FLOOR_DB, type ProcessorSection, type DigitalDeviation, type ProcessorFiltersResult } from './filters/processor-filters';

export { designEq, EQ_DESIGN_DEFAULTS, EQ_DESIGN_LIMITS, type EqDesign } from './eq/design-eq';
export { MAX_HOUSE_RISE_DB, HOUSE_CURVE_DEFINITION, type EqTarget } from './eq/eq-target';
export { NULL_DEFINITION } from './eq/find-nulls';
export { RESIDUAL_DEFINITION } from './eq/eq-residual';

export { SILENCE_DB, type MeasuredResponse, type PathSpec, type ResponseCurves, type BlendResult } from './blend/blend-types';
export { blendResponse } from './blend/blend-response';
export { pathResponse } from './blend/path-response';
export { MAX_PATH_EQ_FILTERS } from './blend/path-plan';
export { blendSumResponse } from './blend/blend-sum';
export { blendGrid, isBlendGrid } from './blend/blend-kernel';
export { blendMetrics, type BlendMetrics } from './blend/blend-metrics';

export { alignSubToMains } from './timing/align-sub-to-mains';
export { withoutCommonDelayMs } from './timing/remove-common-delay';

export { systemPaths, retimeSources, type SystemModel, type SystemSource } from './system/system-model';
export { assessBlend, bandLevelDb, FLATNESS_DEFINITION, type BlendAssessment } from './system/blend-assessment';
export { ADVICE_RULES, compareAssessments, type AdviceComparison } from './system/advice-rules';
export { rolloffMinus3DbHz } from './system/rolloff-minus3';
export { searchTiming, smallestChange, type AssessedMove } from './system/timing-search';
export { subTimingAdvice, groupTimingAdvice } from './system/timing-advice';
export { crossoverSweep, rankSweepRows, type RankableSweepRow } from './system/crossover-sweep';

export type { PointM, ModeKind, RoomMode } from './room/room-types';
export { roomModes } from './room/room-modes';
export { schroederFrequencyHz } from './room/schroeder-frequency';
export { statisticalModeCount } from './room/statistical-mode-count';
export { modeCountsPerThirdOctave } from './room/mode-counts-per-third-octave';
export { nearCoincidentModes } from './room/near-coincident-modes';
export { bonelloCheck } from './room/bonello-check';
export { roomProportionCheck } from './room/room-proportion-check';
export { modalTransfer } from './room/modal-transfer';
export { modalTransfers } from './room/modal-transfers';
export { seatSpreadDb } from './room/seat-spread';
export { modePressureAt, modePressureMap, nodeAlignedCellCount } from './room/mode-pressure-map';
export { quarterWaveNotchHz } from './room/quarter-wave-notch';
export { summedModalResponse } from './room/summed-modal-response';
export { pathsThroughRoomPower } from './room/paths-through-room';

export { LAYOUT_TEMPLATES, layoutTemplate, type LayoutChannel, type AngleRangeDeg } from './layout/layout-templates';
export { speakerAngles } from './layout/speaker-angles';
export { checkSpeakerAngles } from './layout/check-speaker-angles';
export { includedAngleDeg } from './layout/included-angle';
export { toeInDeg } from './layout/toe-in';
export { channelSettings, SETTING_RESOLUTION, type ChannelSettings, type ChannelSettingsOptions } from './layout/channel-settings';
export { nominalSpeakerPosition } from './layout/nominal-position';
export { pairPlacement } from './layout/pair-placement';

export { maxSplDb, REFERENCE_LEVEL_DB, REFERENCE_PEAK_DB, LFE_PEAK_DB } from './headroom/max-spl';
export { headroomCheck } from './headroom/headroom-check';
export { powerLimit } from './headroom/power-limit';
export { exposureMinutes } from './headroom/exposure-time';
export { combinedSplDb } from './headroom/combined-spl';

export type { MeasuredPathInput } from './measured/measured-types';
export { resampleCurve } from './measured/resample-curve';
export { unwrapDeg } from './measured/unwrap-phase';
export { smoothFractionalOctave } from './measured/smooth-fractional-octave';
export { minimumPhaseDeg } from './measured/minimum-phase';
export { applyPathToMeasured } from './measured/apply-path-to-measured';
export { predictMeasuredBlend } from './measured/predict-measured-blend';
export { bestMeasuredAlignment } from './measured/best-measured-alignment';
export { bandPowerAverageDb } from './measured/band-power-average';
export { inRoomExtension, EXTENSION_BAND_DEFAULTS } from './measured/in-room-extension';
export { crossoverAgainstExtension, type CrossoverAgainstExtension } from './measured/crossover-against-extension';
export { spatialAverageDb } from './measured/spatial-average';
export { compareRuns, COMPARE_MIN_COMMON_OCTAVES } from './measured/compare-runs';
export { wrapDeg } from './internal/angles';

export { SEAT_BALANCE_DEFAULT_LIMITS, SEAT_BALANCE_RESOLUTION, type SubSetting, type SeatBalanceLimits, type SeatBalanceMeasures } from './seat-balance/seat-balance-types';
export { seatBalanceEvaluator, type SeatTransfer, type SeatBalanceEvaluator } from './seat-balance/seat-balance-evaluator';
export { optimizeSubSettings } from './seat-balance/optimize-sub-settings';
export { subPlacementSearch, combinationCount } from './seat-balance/sub-placement-search';
export { defaultSubCandidates } from './seat-balance/default-sub-candidates';
export { measuredSeatTransfer } from './seat-balance/measured-seat-transfer';

export { impulseFromResponse } from './time/impulse-from-response';
export { pathsTimeResponse } from './time/paths-time-response';
export type { TimeSignal } from './time/impulse-from-bins';
