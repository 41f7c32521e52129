import { describe, expect, it } from 'vitest';
import { refineSlopeOrder } from '@/lib/validations/slope';
import { issueSink } from './issue-sink';

describe('refineSlopeOrder', () => {
  it('Linkwitz–Riley 2, 4 and 8 only, the issue at the given path; Butterworth any order', () => {
    const { issues, ctx } = issueSink();
    for (const order of [1, 2, 3, 4, 6, 8]) refineSlopeOrder({ family: 'linkwitz-riley', order }, ctx, ['subLowpass', 'order']);
    for (const order of [1, 3, 5, 7]) refineSlopeOrder({ family: 'butterworth', order }, ctx);
    expect(issues).toEqual([1, 3, 6].map(() => ({ path: ['subLowpass', 'order'], message: 'Linkwitz–Riley order must be 2, 4 or 8' })));
  });
});
