'use client';

import { useCallback, useState } from 'react';

/**
 * Width in px of the element the returned ref is attached to, tracked with a ResizeObserver.
 * Until the first measurement (and during server rendering) it is `fallbackPx`; a fixed
 * `widthPx` skips measuring altogether (print, tests, thumbnails).
 */
export function useContainerWidth<T extends HTMLElement>(
  fallbackPx = 640,
  widthPx?: number,
): { ref: (element: T | null) => (() => void) | undefined; widthPx: number } {
  const [measuredPx, setMeasuredPx] = useState<number | null>(null);
  const fixed = widthPx !== undefined;
  const ref = useCallback(
    (element: T | null) => {
      if (!element || fixed || typeof ResizeObserver === 'undefined') return undefined;
      const observer = new ResizeObserver((entries) => {
        const width = entries[0]?.contentRect.width ?? 0;
        if (width > 0) setMeasuredPx(Math.round(width));
      });
      observer.observe(element);
      return () => observer.disconnect();
    },
    [fixed],
  );
  return { ref, widthPx: widthPx ?? measuredPx ?? fallbackPx };
}
