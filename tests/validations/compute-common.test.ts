import { describe, expect, it } from 'vitest';
import { refineRequestInsideRoom } from '@/lib/validations/compute-common';
import { issueSink } from './issue-sink';

describe('refineRequestInsideRoom', () => {
  it('one issue per coordinate beyond a wall, listener then seats, speakers and subs', () => {
    const { issues, ctx } = issueSink();
    const room = { widthM: 4, lengthM: 5, heightM: 2.5 };
    refineRequestInsideRoom(ctx, room, {
      listener: { xM: 2, yM: 3, zM: 1.1 },
      seats: [{ name: 'Sofa', xM: 2, yM: 6, zM: 1 }],
      speakers: [{ channel: 'L', xM: 4.5, yM: 1, zM: 3 }],
      subs: [{ name: 'Sub 1', xM: 0.3, yM: 0.3, zM: 0.2 }],
    });
    expect(issues.map((i) => i.path.join('.'))).toEqual(['seats.0.yM', 'speakers.0.xM', 'speakers.0.zM']);
    expect(issues[0]?.message).toBe('Sofa is 6 m into a 5 m long room');
    expect(issues[1]?.message).toBe('L is 4.5 m across in a 4 m wide room');
  });
});
