// Seamline's mathematics: pure TypeScript, no I/O. This file only re-exports.

export { speedOfSoundMps } from './air/speed-of-sound';
export { arrivalTimeMs, type ArrivalTimeOptions } from './air/arrival-time';

export { logFrequencyGridHz, MAX_GRID_POINTS, type LogFrequencyGridOptions } from './grid/log-frequency-grid';
export { fractionalOctaveBands, OCTAVE_RATIO_BASE_TEN, type FractionalOctaveBands, type FractionalOctaveBandsOptions } from './grid/fractional-octave-bands';

export type { FilterFamily, FilterResponseKind, FilterSpec, FilterShape, RolloffSpec, RolloffChain, SectionKind, AnalogSection, ComplexResponse } from './filters/filter-types';
export { butterworthQ } from './filters/butterworth-q';
export { filterSections, rolloffSections, LINKWITZ_RILEY_ORDERS, MAX_SECTION_Q, MAX_ROLLOFFS } from './filters/analog-sections';
export {
  filterResponse,
  rolloffResponse,
  secondOrderSectionResponse,
  sectionsResponse,
  type FilterResponseOptions,
  type RolloffResponseOptions,
  type SecondOrderSectionOptions,
} from './filters/filter-response';

export { MAX_PATHS, SILENCE_DB, type PathSpec, type ResponseCurves, type PathCurves, type BlendResult, type BlendOptions } from './blend/blend-types';
export { blendResponse } from './blend/blend-response';
export { blendSumResponse, type BlendSumOptions, type BlendSumResult } from './blend/blend-sum';
export { blendGrid, isBlendGrid, type BlendGrid } from './blend/blend-kernel';
export { blendMetrics, type BlendMetrics, type BlendMetricsOptions } from './blend/blend-metrics';

export { alignSubToMains } from './timing/align-sub-to-mains';
export type { AlignmentResult, AlignSubToMainsOptions, LevelVersusDelay } from './timing/timing-types';

export { systemPaths, retimeSources, type SystemModel, type SystemSource, type CrossoverSetting } from './system/system-model';
export { assessBlend, assessmentGrid, bandLevelDb, effectiveMinus3Hz, FLATNESS_DEFINITION, ASSESSMENT_FLOOR_HZ, type AssessBlendOptions, type BlendAssessment } from './system/blend-assessment';
export { ADVICE_RULES, compareAssessments, type AdviceComparison } from './system/advice-rules';
export { rolloffMinus3DbHz } from './system/rolloff-minus3';
export { searchTiming, smallestChange, type TimingMove, type AssessedMove, type FlatnessVersusShift, type TimingSearchOptions, type TimingSearchResult } from './system/timing-search';
export { subTimingAdvice, groupTimingAdvice, type TimingAdvice, type SubTimingAdvice } from './system/timing-advice';
export { crossoverSweep, rankSweepRows, type RankableSweepRow, type CrossoverSweepOptions, type CrossoverSweepRow, type CrossoverSweepResult } from './system/crossover-sweep';

export type { RoomDimensions, PointM, ModeKind, RoomMode } from './room/room-types';
export { roomModes, MAX_ROOM_MODES, type RoomModesOptions, type RoomModesResult } from './room/room-modes';
export { schroederFrequencyHz, type SchroederOptions } from './room/schroeder-frequency';
export { statisticalModeCount, type StatisticalModeCountOptions } from './room/statistical-mode-count';
export { modeCountsPerThirdOctave, type ModeBandCount, type ModeCountsOptions } from './room/mode-counts-per-third-octave';
export { nearCoincidentModes, type CoincidentPair, type NearCoincidentOptions } from './room/near-coincident-modes';
export { bonelloCheck, type BonelloOptions, type BonelloResult } from './room/bonello-check';
export { roomProportionCheck, type ProportionCriterion, type RoomProportionResult } from './room/room-proportion-check';
export { modalTransfer, type ModalTransferOptions, type ModalTransferResult } from './room/modal-transfer';
export { modalTransfers, MAX_MODAL_PAIRS, type ModalTransfersOptions, type ModalTransfersResult, type ModalTransferCurve } from './room/modal-transfers';
export { seatSpreadDb, type SeatSpreadOptions, type SeatSpreadResult } from './room/seat-spread';
export { modePressureMap, type ModePressureMap, type ModePressureMapOptions } from './room/mode-pressure-map';
export { quarterWaveNotchHz, type QuarterWaveNotchOptions } from './room/quarter-wave-notch';
export { summedModalResponse, type ModalSource, type SummedModalResponseOptions, type SummedModalResponseResult, type ComplexPressure } from './room/summed-modal-response';

export { LAYOUT_TEMPLATES, layoutTemplate, type LayoutTemplate, type LayoutChannel, type AngleRangeDeg, type ChannelSide } from './layout/layout-templates';
export { speakerAngles, type SpeakerAngles, type SpeakerAnglesOptions } from './layout/speaker-angles';
export { checkSpeakerAngles, type CheckSpeakerAnglesOptions, type SpeakerAngleCheck } from './layout/check-speaker-angles';
export { includedAngleDeg, type IncludedAngleOptions } from './layout/included-angle';
export { toeInDeg, type ToeInOptions, type ToeInResult } from './layout/toe-in';
export { channelSettings, SETTING_RESOLUTION, type ChannelSettings, type ChannelSettingsMain, type ChannelSettingsSub, type ChannelSettingsOptions } from './layout/channel-settings';
export { nominalSpeakerPosition, type NominalPosition, type NominalPositionOptions } from './layout/nominal-position';

export { maxSplDb, REFERENCE_LEVEL_DB, REFERENCE_PEAK_DB, LFE_PEAK_DB, type MaxSplOptions, type MaxSplResult } from './headroom/max-spl';
export { headroomCheck, type HeadroomCheckOptions, type HeadroomCheckResult } from './headroom/headroom-check';
export { exposureMinutes } from './headroom/exposure-time';
export { combinedSplDb, type CombinedSplOptions } from './headroom/combined-spl';

export type { MeasuredCurve, MeasuredPathInput } from './measured/measured-types';
export { resampleCurve, type ResampleCurveOptions, type ResampledCurve } from './measured/resample-curve';
export { unwrapDeg } from './measured/unwrap-phase';
export { smoothFractionalOctave, type SmoothOptions, type SmoothedCurve } from './measured/smooth-fractional-octave';
export { minimumPhaseDeg, type MinimumPhaseOptions, type MinimumPhaseResult } from './measured/minimum-phase';
export { applyPathToMeasured, type ApplyPathOptions, type ProcessedMeasurement } from './measured/apply-path-to-measured';
export { predictMeasuredBlend, type PredictMeasuredBlendOptions, type MeasuredBlendResult, type MeasuredPathCurves } from './measured/predict-measured-blend';
export { bestMeasuredAlignment, type BestMeasuredAlignmentOptions } from './measured/best-measured-alignment';
export { bandPowerAverageDb, type BandPowerAverage, type BandPowerAverageOptions } from './measured/band-power-average';
export { wrapDeg } from './internal/angles';
