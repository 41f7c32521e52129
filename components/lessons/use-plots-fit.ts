'use client';

import { useCallback, useState, useSyncExternalStore } from 'react';

const WIDE_QUERY = '(min-width: 1024px)';

/**
 * True on a projector or desktop (≥ 1024 px wide, Tailwind's `lg`), false on a phone or small tablet. The server
 * renders the projector layout; the browser switches at once when the screen is narrow.
 */
export function useWideScreen(): boolean {
  return useSyncExternalStore(
    (onChange) => {
      const query = window.matchMedia(WIDE_QUERY);
      query.addEventListener('change', onChange);
      return () => query.removeEventListener('change', onChange);
    },
    () => window.matchMedia(WIDE_QUERY).matches,
    () => true,
  );
}

/** The smallest height the plots are given, px: below it the stage scrolls rather than squeezing them unreadable. */
const MIN_PLOTS_PX = 320;

/**
 * Fits a Step's plots to the height left for them: `stageRef` goes on a box whose height the layout decides (a flex
 * item with min-height 0), its first child holds the plot and everything around it (read-outs, legend). Whatever the
 * plots' SVGs do not take is measured once drawn, and the SVGs get the rest: `plotsHeightPx`, undefined until measured.
 * Re-measured when the window, the Step or the legend changes size.
 */
export function usePlotsFit(): { stageRef: (element: HTMLDivElement | null) => (() => void) | undefined; plotsHeightPx: number | undefined } {
  const [plotsHeightPx, setPlotsHeightPx] = useState<number | undefined>(undefined);
  const stageRef = useCallback((stage: HTMLDivElement | null) => {
    if (!stage || typeof ResizeObserver === 'undefined') return undefined;
    const measure = () => {
      const content = stage.firstElementChild as HTMLElement | null;
      if (!content) return;
      const svgs = content.querySelectorAll<SVGSVGElement>('[data-chart="line"] > svg');
      if (!svgs.length) return;
      let svgPx = 0;
      svgs.forEach((svg) => (svgPx += svg.getBoundingClientRect().height));
      const otherPx = content.getBoundingClientRect().height - svgPx;
      const next = Math.max(MIN_PLOTS_PX, Math.floor(stage.clientHeight - otherPx));
      setPlotsHeightPx((current) => (current !== undefined && Math.abs(current - next) <= 2 ? current : next));
    };
    const observer = new ResizeObserver(measure);
    observer.observe(stage);
    if (stage.firstElementChild) observer.observe(stage.firstElementChild);
    measure();
    return () => observer.disconnect();
  }, []);
  return { stageRef, plotsHeightPx };
}
