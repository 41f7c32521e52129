import { describe, expect, it } from 'vitest';
import { filterOfKind, filterWithWidth, newVoicingPosition, newVoicingSwitch, nextVoicingId, shelfWidth } from '@/components/library/voicing-form';
import { voicingOptionSchema } from '@/lib/validations/system';

describe('the profile form’s voicing helpers', () => {
  it('new ids are short, unused and stable (a rename never changes them)', () => {
    expect(nextVoicingId('switch', [])).toBe('switch1');
    expect(nextVoicingId('switch', ['switch1', 'switch3'])).toBe('switch2');
    expect(newVoicingPosition(['pos1', 'pos2']).id).toBe('pos3');
  });
  it('a new switch, once named, is a valid switch whose first position is flat', () => {
    const s = newVoicingSwitch(['switch1']);
    expect(s.id).toBe('switch2');
    expect(s.positions[0]!.filters).toEqual([]);
    const named = { ...s, name: 'Treble', positions: s.positions.map((p, i) => ({ ...p, name: p.name || `Position ${i + 1}` })) };
    expect(voicingOptionSchema.safeParse(named).success).toBe(true);
  });
  it('changing the kind keeps frequency and gain; a shelf’s width switches between slope and Q', () => {
    const shelf = { kind: 'low-shelf' as const, cornerHz: 150, gainDb: -3, slope: 0.8 };
    expect(filterOfKind(shelf, 'peaking')).toEqual({ kind: 'peaking', centerHz: 150, gainDb: -3, q: 1 });
    expect(filterOfKind(filterOfKind(shelf, 'peaking'), 'high-shelf')).toEqual({ kind: 'high-shelf', cornerHz: 150, gainDb: -3, slope: 1 });
    expect(filterOfKind(shelf, 'high-shelf')).toEqual({ ...shelf, kind: 'high-shelf' });
    expect(shelfWidth(shelf)).toBe('slope');
    const byQ = filterWithWidth(shelf, 'q');
    expect(byQ).toEqual({ kind: 'low-shelf', cornerHz: 150, gainDb: -3, q: 0.71 });
    expect(shelfWidth(byQ)).toBe('q');
    expect(filterWithWidth(byQ, 'slope')).toEqual({ kind: 'low-shelf', cornerHz: 150, gainDb: -3, slope: 1 });
  });
});
