import { chosenPosition, staleVoicingChoices } from '@/lib/system-model/voicing';
import type { SpeakerProfile } from '@/lib/validations/system';

type Choice = Readonly<Record<string, string>>;

/** One select of the voicing picker: a switch of the profile, its positions, and the value it shows. */
export interface VoicingRow {
  switchId: string;
  name: string;
  /** The chosen position's id; a stale position id stays selected (shown as such) until someone picks another. */
  value: string;
  options: { id: string; name: string }[];
  /** Set when the choice names a position this switch does not have: what the select says about it. */
  stale: string | null;
  /** The largest boost of the position it plays in, dB (0 when it only cuts or is flat). */
  boostDb: number;
}

/** What the picker shows for a speaker's choice: a row per switch of its profile, and the choices for switches it no longer has. */
export function voicingRows(profile: SpeakerProfile | undefined, choice: Choice | undefined): { rows: VoicingRow[]; orphans: { switchId: string; positionId: string }[] } {
  const stale = staleVoicingChoices(profile, choice);
  const rows = (profile?.voicingOptions ?? []).map((o): VoicingRow => {
    const options = o.positions.map((p) => ({ id: p.id, name: p.name }));
    const boostDb = Math.max(0, ...(chosenPosition(o, choice)?.filters ?? []).map((f) => f.gainDb));
    const bad = stale.find((s) => s.missing === 'position' && s.switchId === o.id);
    if (bad) {
      const text = `“${bad.positionId}” is not a position of this switch (the profile changed): it plays as ${bad.playsAs ?? 'its first position'}`;
      return { switchId: o.id, name: o.name, value: bad.positionId, options: [{ id: bad.positionId, name: `${bad.positionId} (not on the profile)` }, ...options], stale: text, boostDb };
    }
    return { switchId: o.id, name: o.name, value: chosenPosition(o, choice)?.id ?? '', options, stale: null, boostDb };
  });
  const orphans = stale.filter((s) => s.missing === 'switch').map(({ switchId, positionId }) => ({ switchId, positionId }));
  return { rows, orphans };
}

/** The choice with one switch set to a position (every other entry kept, stale ones too). */
export function withVoicingChoice(choice: Choice | undefined, switchId: string, positionId: string): Record<string, string> {
  return { ...choice, [switchId]: positionId };
}

/** The choice without one switch's entry (the switch then plays in its first position). */
export function withoutVoicingChoice(choice: Choice | undefined, switchId: string): Record<string, string> {
  const next = { ...choice };
  delete next[switchId];
  return next;
}
