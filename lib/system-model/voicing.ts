/**
 * Voicing options: the positions a System picks on a Speaker profile's back-panel switches, as the EQ filters the
 * speaker then runs. A switch the choice does not name is in its first position; a choice naming a switch or a
 * position the profile no longer has (the profile was changed) is ignored here — the switch plays in its first
 * position — and listed by `staleVoicingChoices`, so the editor can say so instead of dropping it from the document.
 */
import type { EqFilter } from '@/dsp';
import type { Speaker, SpeakerProfile, SystemDocument } from '@/lib/validations/system';
import { profileById } from './geometry';

type VoicingChoice = Readonly<Record<string, string>>;
type VoicingSwitch = SpeakerProfile['voicingOptions'][number];
type VoicingPosition = VoicingSwitch['positions'][number];

/** The position a switch is in for a choice: the chosen one when the switch has it, else its first. */
export function chosenPosition(option: VoicingSwitch, choice: VoicingChoice | undefined): VoicingPosition | undefined {
  const picked = choice?.[option.id];
  return option.positions.find((p) => p.id === picked) ?? option.positions[0];
}

/**
 * The EQ filters of a speaker's voicing: the filters of the position each of its profile's switches is in, switch by
 * switch in the profile's order. No profile or no switches: none.
 * @example voicingFilters(profile, { treble: 'up2' }) // [{ kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 1 }]
 */
export function voicingFilters(profile: SpeakerProfile | undefined, choice: VoicingChoice | undefined): EqFilter[] {
  if (!profile) return [];
  return profile.voicingOptions.flatMap((option) => chosenPosition(option, choice)?.filters ?? []);
}

/** A choice the profile cannot honour: its switch is gone, or the switch has no such position. */
export interface StaleVoicingChoice {
  switchId: string;
  positionId: string;
  /** 'switch': the profile has no switch of that id; 'position': the switch has no position of that id. */
  missing: 'switch' | 'position';
  /** The switch's name when the switch is still there. */
  switchName?: string;
  /** The position the switch plays in instead (its first), when the switch is still there. */
  playsAs?: string;
}

/** Every entry of a choice that names a switch or a position the profile does not have (in the choice's order). */
export function staleVoicingChoices(profile: SpeakerProfile | undefined, choice: VoicingChoice | undefined): StaleVoicingChoice[] {
  const stale: StaleVoicingChoice[] = [];
  for (const [switchId, positionId] of Object.entries(choice ?? {})) {
    const option = profile?.voicingOptions.find((o) => o.id === switchId);
    if (!option) stale.push({ switchId, positionId, missing: 'switch' });
    else if (!option.positions.some((p) => p.id === positionId)) {
      stale.push({ switchId, positionId, missing: 'position', switchName: option.name, playsAs: option.positions[0]?.name });
    }
  }
  return stale;
}

/** One short line of the positions a speaker's switches are in ("Treble: +2 dB · Placement: Near a wall"); null without switches. */
export function voicingSummary(profile: SpeakerProfile | undefined, choice: VoicingChoice | undefined): string | null {
  if (!profile || profile.voicingOptions.length === 0) return null;
  return profile.voicingOptions.map((o) => `${o.name}: ${chosenPosition(o, choice)?.name ?? '—'}`).join(' · ');
}

/**
 * Blend's one line on the paths' voicing and EQ: the shown main channel's switch positions and each sub's, with the
 * number of processor EQ filters a sub runs ("L — Treble: +2 dB · Placement: Near a wall; Sub — Boundary: Open · EQ 2
 * filters"), and how many choices are stale. Null when no path has switches, EQ or a stale choice.
 */
export function pathsVoicingLine(doc: SystemDocument, speaker: Speaker): { text: string; staleCount: number } | null {
  const parts: string[] = [];
  let staleCount = 0;
  const add = (name: string, profileId: string, choice: Readonly<Record<string, string>>, eqCount: number) => {
    const profile = profileById(doc, profileId);
    staleCount += staleVoicingChoices(profile, choice).length;
    const bits = [voicingSummary(profile, choice), eqCount > 0 ? `EQ ${eqCount} filter${eqCount === 1 ? '' : 's'}` : null].filter((b): b is string => b !== null);
    if (bits.length > 0) parts.push(`${name} — ${bits.join(' · ')}`);
  };
  add(speaker.channel, speaker.profileId, speaker.voicing, 0);
  for (const s of doc.subs) add(s.name, s.profileId, s.voicing, s.eq.length);
  return parts.length > 0 || staleCount > 0 ? { text: parts.join('; '), staleCount } : null;
}
