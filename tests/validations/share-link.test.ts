import { describe, expect, it } from 'vitest';
import { isShareToken } from '@/lib/validations/share-link';

describe('share-link tokens', () => {
  it('isShareToken: 16–64 base64url characters', () => {
    expect(isShareToken('A'.repeat(43))).toBe(true);
    expect(isShareToken('a-b_c'.repeat(4))).toBe(true);
    expect(isShareToken('A'.repeat(15))).toBe(false);
    expect(isShareToken('A'.repeat(65))).toBe(false);
    expect(isShareToken(`${'A'.repeat(20)}/`)).toBe(false);
  });
});
