import { describe, expect, it } from 'vitest';
import { voicingRows, withoutVoicingChoice, withVoicingChoice } from '@/components/system/voicing-rows';
import { voicingFilters } from '@/lib/system-model/voicing';
import type { SpeakerProfile } from '@/lib/validations/system';
import { TEST_MAIN } from '../../system-model/test-system';

// The voicing picker's rows: a select per switch of the profile showing its positions; a stale choice is shown as such
// and kept in the document until someone picks a position or forgets it. Invented switches.
const PROFILE: SpeakerProfile = {
  ...TEST_MAIN,
  voicingOptions: [
    { id: 'treble', name: 'Treble', positions: [{ id: 'flat', name: '0 dB', filters: [] }, { id: 'up', name: '+2 dB', filters: [{ kind: 'high-shelf', cornerHz: 3000, gainDb: 2, slope: 1 }] }] },
    { id: 'placement', name: 'Placement', positions: [{ id: 'free', name: 'Free-standing', filters: [] }, { id: 'wall', name: 'Near a wall', filters: [{ kind: 'low-shelf', cornerHz: 150, gainDb: -3, slope: 1 }] }] },
  ],
};

describe('voicingRows(profile, choice)', () => {
  it('a select per switch with its positions; a switch not chosen shows its first position', () => {
    const { rows, orphans } = voicingRows(PROFILE, { placement: 'wall' });
    expect(rows.map((r) => [r.switchId, r.name, r.value, r.options.map((o) => o.name), r.stale])).toEqual([
      ['treble', 'Treble', 'flat', ['0 dB', '+2 dB'], null],
      ['placement', 'Placement', 'wall', ['Free-standing', 'Near a wall'], null],
    ]);
    expect(orphans).toEqual([]);
    expect(voicingRows(TEST_MAIN, {})).toEqual({ rows: [], orphans: [] });
  });
  it('each row says how much the position it plays in boosts (for the headroom caution)', () => {
    expect(voicingRows(PROFILE, { treble: 'up', placement: 'wall' }).rows.map((r) => r.boostDb)).toEqual([2, 0]);
    expect(voicingRows(PROFILE, { treble: 'plus3' }).rows.map((r) => r.boostDb)).toEqual([0, 0]);
  });
  it('a stale position stays selected, marked, with what plays instead; a stale switch is listed apart', () => {
    const { rows, orphans } = voicingRows(PROFILE, { treble: 'plus3', bass: 'cut' });
    expect(rows[0]!.value).toBe('plus3');
    expect(rows[0]!.options[0]).toEqual({ id: 'plus3', name: 'plus3 (not on the profile)' });
    expect(rows[0]!.stale).toContain('plays as 0 dB');
    expect(rows[1]!.stale).toBeNull();
    expect(orphans).toEqual([{ switchId: 'bass', positionId: 'cut' }]);
  });
});

describe('what the picker writes', () => {
  it('picking writes voicing[switchId] = positionId and keeps every other entry, stale ones too', () => {
    const next = withVoicingChoice({ treble: 'plus3', bass: 'cut' }, 'placement', 'wall');
    expect(next).toEqual({ treble: 'plus3', bass: 'cut', placement: 'wall' });
    expect(voicingFilters(PROFILE, next)).toEqual([{ kind: 'low-shelf', cornerHz: 150, gainDb: -3, slope: 1 }]);
    expect(withVoicingChoice(undefined, 'treble', 'up')).toEqual({ treble: 'up' });
  });
  it('"Forget" removes only that entry, and does not change the choice it was given', () => {
    const choice = { treble: 'up', bass: 'cut' };
    expect(withoutVoicingChoice(choice, 'bass')).toEqual({ treble: 'up' });
    expect(choice).toEqual({ treble: 'up', bass: 'cut' });
  });
});
