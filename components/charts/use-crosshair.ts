'use client';

import { useCallback, useState } from 'react';
import type { KeyboardEvent, PointerEvent } from 'react';

export interface CrosshairOptions {
  /** Controlled cursor position in data units; `null` hides it. Leave undefined to let the plot own it. */
  value?: number | null;
  /** Called with the new position, or null when the pointer leaves. */
  onChange?: (value: number | null) => void;
  /** SVG width in user units (the viewBox width), to map client px to SVG px. */
  widthPx: number;
  /** Maps an x in SVG px to a data value, or null outside the plot area. */
  pxToValue: (xPx: number) => number | null;
  /** Next cursor value for arrow keys: `direction` ±1, `large` with Shift/PageUp/PageDown. */
  step: (current: number | null, direction: 1 | -1, large: boolean) => number;
  /** Values for Home and End. */
  bounds: readonly [number, number];
}

export interface Crosshair {
  cursor: number | null;
  setCursor: (value: number | null) => void;
  handlers: {
    onPointerDown: (event: PointerEvent<SVGSVGElement>) => void;
    onPointerMove: (event: PointerEvent<SVGSVGElement>) => void;
    onPointerLeave: (event: PointerEvent<SVGSVGElement>) => void;
    onKeyDown: (event: KeyboardEvent<SVGSVGElement>) => void;
  };
}

/**
 * Pointer, touch and keyboard handling for a plot's crosshair. Mouse: follows the pointer and
 * clears on leave. Touch: tap or drag sideways to place it; it stays after lifting the finger so
 * the read-out can be read (use `touch-action: pan-y` on the svg so vertical scrolling still
 * works). Keyboard: arrows move it, Shift+arrows move further, Home/End, Escape clears.
 */
export function useCrosshair(options: CrosshairOptions): Crosshair {
  const { value, onChange, widthPx, pxToValue, step, bounds } = options;
  const [own, setOwn] = useState<number | null>(null);
  const controlled = value !== undefined;
  const cursor = controlled ? value : own;

  const setCursor = useCallback(
    (next: number | null) => {
      if (!controlled) setOwn(next);
      onChange?.(next);
    },
    [controlled, onChange],
  );

  const fromEvent = (event: PointerEvent<SVGSVGElement>): number | null => {
    const rect = event.currentTarget.getBoundingClientRect();
    if (rect.width <= 0) return null;
    return pxToValue(((event.clientX - rect.left) * widthPx) / rect.width);
  };

  const place = (event: PointerEvent<SVGSVGElement>) => {
    const next = fromEvent(event);
    if (next !== null) setCursor(next);
    else if (event.pointerType === 'mouse') setCursor(null);
  };

  return {
    cursor,
    setCursor,
    handlers: {
      onPointerDown: place,
      onPointerMove: place,
      onPointerLeave: (event) => {
        if (event.pointerType === 'mouse') setCursor(null);
      },
      onKeyDown: (event) => {
        const large = event.shiftKey;
        let next: number | null | undefined;
        switch (event.key) {
          case 'ArrowRight':
          case 'ArrowUp':
            next = step(cursor, 1, large);
            break;
          case 'ArrowLeft':
          case 'ArrowDown':
            next = step(cursor, -1, large);
            break;
          case 'PageUp':
            next = step(cursor, 1, true);
            break;
          case 'PageDown':
            next = step(cursor, -1, true);
            break;
          case 'Home':
            next = bounds[0];
            break;
          case 'End':
            next = bounds[1];
            break;
          case 'Escape':
            next = null;
            break;
          default:
            return;
        }
        event.preventDefault();
        setCursor(next === null ? null : Math.min(bounds[1], Math.max(bounds[0], next)));
      },
    },
  };
}
