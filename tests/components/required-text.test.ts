import { describe, expect, it } from 'vitest';
import { requiredTextMessage } from '@/components/ui/required-text';

// Common practice: a required name is refused when empty or only spaces (the schemas trim before min(1)).
describe('requiredTextMessage: the inline check of a required name or title', () => {
  it('names the field when the text is empty or only spaces', () => {
    expect(requiredTextMessage('Step title', '')).toBe('Step title is required');
    expect(requiredTextMessage('Step title', '   ')).toBe('Step title is required');
  });
  it('says the limit when the trimmed text is too long, and nothing when it fits', () => {
    expect(requiredTextMessage('System name', 'x'.repeat(201), 200)).toBe('System name must be at most 200 characters');
    expect(requiredTextMessage('System name', ` ${'x'.repeat(200)} `, 200)).toBeNull();
    expect(requiredTextMessage('System name', 'Garage cinema (invented)')).toBeNull();
  });
});
