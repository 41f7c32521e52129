'use client';

import type { ReactNode } from 'react';
import { Notice } from '@/components/ui/notice';
import type { OutsidePosition } from '@/lib/system-model/room-bounds';

/**
 * Says which seats, speakers and subs lie outside the room, one line each ("L is 40 m across in a 4.9 m wide room"),
 * where a panel would otherwise show numbers computed from them. Nothing is shown when `outside` is empty.
 */
export function OutsideRoomNotice({ outside, title = 'Outside the room', children, testId = 'outside-room' }: { outside: readonly OutsidePosition[]; title?: string; children?: ReactNode; testId?: string }) {
  if (outside.length === 0) return null;
  return (
    <div data-testid={testId}>
      <Notice kind="error" title={title}>
        <ul className="mt-1 list-disc pl-5">
          {outside.map((o) => (
            <li key={o.path} data-path={o.path}>
              {o.message}
            </li>
          ))}
        </ul>
        {children}
      </Notice>
    </div>
  );
}

/** The message for one field path (`seats.0.yM`), if that coordinate is outside the room. */
export const outsideMessage = (outside: readonly OutsidePosition[], path: string): string | undefined => outside.find((o) => o.path === path)?.message;
