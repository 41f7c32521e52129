import { speedOfSoundMps } from '../air/speed-of-sound';
import { assertFinite } from '../internal/guards';
import { withoutCommonDelayMs } from '../timing/remove-common-delay';

/** One main channel as the processor is told it: distance to the MLP, delay on top of distance alignment, level offset. */
export interface ChannelSettingsMain {
  readonly distanceM: number;
  /** Delay added on top of distance alignment (the System's mains delay), ms ≥ 0. */
  readonly extraDelayMs: number;
  /** Level offset on top of the inverse-square level match, dB. */
  readonly trimDb: number;
}

/** One sub as the processor is told it. */
export interface ChannelSettingsSub {
  readonly distanceM: number;
  /** Delay added on top of distance alignment (the sub's own delay from Timing), ms ≥ 0. */
  readonly extraDelayMs: number;
  /** Sub gain, dB (subs are level-matched by measurement; no inverse-square term). */
  readonly gainDb: number;
}

/** Options of {@link channelSettings}. */
export interface ChannelSettingsOptions {
  readonly temperatureC: number;
  readonly mains: readonly ChannelSettingsMain[];
  readonly subs: readonly ChannelSettingsSub[];
}

/** The settings a processor runs, each rounded once to what a processor takes (0.01 ms, 0.1 dB, 0.01 m). */
export interface ChannelSettings {
  readonly mains: { readonly distanceM: number; readonly delayMs: number; readonly trimDb: number }[];
  readonly subs: { readonly distanceM: number; readonly delayMs: number; readonly gainDb: number }[];
  /** The farthest source (index into mains, then subs) and its distance, m. */
  readonly farthestIndex: number;
  readonly farthestDistanceM: number;
}

/** Processor resolutions the settings are rounded to. */
export const SETTING_RESOLUTION = { delayMs: 0.01, trimDb: 0.1, distanceM: 0.01 } as const;

const roundToStep = (value: number, step: number): number => {
  const r = Math.round(value / step) * step;
  const decimals = Math.max(0, -Math.floor(Math.log10(step) + 1e-9));
  const out = Number(r.toFixed(decimals));
  return out === 0 ? 0 : out;
};

/**
 * Every channel's and sub's processor delay and level, the one definition behind Layout, Timing, the Settings sheet,
 * the exports and the API. Delays: distance alignment to the farthest source the processor feeds (mains and subs),
 * (d_max − d)/c, plus each source's extra delay; then the delay every source shares is taken out, so the smallest is
 * 0 ms and none is negative (processor convention; common practice). Trims: the inverse-square level match among the
 * mains, 20·log10(d / d_max,mains) (free field; a measured level match supersedes it), plus each channel's offset.
 * Rounded here, once, to 0.01 ms, 0.1 dB and 0.01 m, so what a screen shows is what the processor gets.
 * @example channelSettings({ temperatureC: 20, mains: [{ distanceM: 3, extraDelayMs: 0, trimDb: 0 }], subs: [{ distanceM: 4, extraDelayMs: 1, gainDb: 0 }] }).mains[0].delayMs // 1.91 (2.91 + 0 against the sub's 0 + 1; the shared 1 ms taken out)
 */
export function channelSettings({ temperatureC, mains, subs }: ChannelSettingsOptions): ChannelSettings {
  const c = speedOfSoundMps(temperatureC);
  const all = [...mains.map((m, i) => ({ ...m, label: `mains[${i}]` })), ...subs.map((s, i) => ({ ...s, label: `subs[${i}]` }))];
  let farthestIndex = -1;
  all.forEach((a, i) => {
    if (!Number.isFinite(a.distanceM) || a.distanceM <= 0) throw new RangeError(`${a.label}.distanceM must be a finite distance greater than 0 (got ${String(a.distanceM)})`);
    assertFinite(`${a.label}.extraDelayMs`, a.extraDelayMs);
    if (a.extraDelayMs < 0) throw new RangeError(`${a.label}.extraDelayMs must be at least 0 (got ${a.extraDelayMs})`);
    if (farthestIndex < 0 || a.distanceM > (all[farthestIndex] as (typeof all)[number]).distanceM) farthestIndex = i;
  });
  if (farthestIndex < 0) return { mains: [], subs: [], farthestIndex: -1, farthestDistanceM: 0 };
  const farthestDistanceM = (all[farthestIndex] as (typeof all)[number]).distanceM;
  // The alignment part is rounded first, so a change of an extra delay by whole hundredths moves the setting by
  // exactly that much (what Timing recommends is what the processor gets); the shared delay is taken out before the
  // final rounding.
  const delaysMs = withoutCommonDelayMs(all.map((a) => roundToStep((1000 * (farthestDistanceM - a.distanceM)) / c, SETTING_RESOLUTION.delayMs) + a.extraDelayMs));
  let farthestMainM = 0;
  for (const m of mains) farthestMainM = Math.max(farthestMainM, m.distanceM);
  return {
    mains: mains.map((m, i) => {
      assertFinite(`mains[${i}].trimDb`, m.trimDb);
      return {
        distanceM: roundToStep(m.distanceM, SETTING_RESOLUTION.distanceM),
        delayMs: roundToStep(delaysMs[i] as number, SETTING_RESOLUTION.delayMs),
        trimDb: roundToStep(20 * Math.log10(m.distanceM / farthestMainM) + m.trimDb, SETTING_RESOLUTION.trimDb),
      };
    }),
    subs: subs.map((s, j) => {
      assertFinite(`subs[${j}].gainDb`, s.gainDb);
      return {
        distanceM: roundToStep(s.distanceM, SETTING_RESOLUTION.distanceM),
        delayMs: roundToStep(delaysMs[mains.length + j] as number, SETTING_RESOLUTION.delayMs),
        gainDb: roundToStep(s.gainDb, SETTING_RESOLUTION.trimDb),
      };
    }),
    farthestIndex,
    farthestDistanceM,
  };
}
