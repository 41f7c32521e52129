/**
 * The one channel-settings function of a System: every main channel's and sub's distance, processor delay and
 * level, as dsp/layout/channel-settings defines them (distance alignment to the farthest source, the mains delay and
 * each sub's delay on top, the common delay taken out; inverse-square trims plus each channel's offset), rounded once.
 * Layout, Timing, Blend, the Settings sheet, the exports and the API all read these numbers.
 */
import { channelSettings, type ChannelSettings } from '@/dsp';
import type { SystemDocument } from '@/lib/validations/system';
import { distanceToSeatM } from './geometry';

const cache = new WeakMap<SystemDocument, ChannelSettings>();

/** The System's processor settings, per speaker (document order) and per sub (document order). */
export function systemChannelSettings(doc: SystemDocument): ChannelSettings {
  const hit = cache.get(doc);
  if (hit) return hit;
  const settings = channelSettings({
    temperatureC: doc.room.temperatureC,
    mains: doc.speakers.map((s) => ({ distanceM: distanceToSeatM(doc, s), extraDelayMs: doc.bassManagement.mainsDelayMs, trimDb: s.trimDb })),
    subs: doc.subs.map((s) => ({ distanceM: distanceToSeatM(doc, s), extraDelayMs: s.delayMs, gainDb: s.gainDb })),
  });
  cache.set(doc, settings);
  return settings;
}
