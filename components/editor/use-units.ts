'use client';

import { useCallback, useSyncExternalStore } from 'react';
import type { UnitSystem } from '@/components/system/system-context';

const UNITS_KEY = 'seamline:units';
// Same-tab changes: the storage event fires only in other tabs.
const UNITS_EVENT = 'seamline-units';

function subscribeUnits(cb: () => void) {
  window.addEventListener('storage', cb);
  window.addEventListener(UNITS_EVENT, cb);
  return () => {
    window.removeEventListener('storage', cb);
    window.removeEventListener(UNITS_EVENT, cb);
  };
}
const readUnits = (): UnitSystem => (window.localStorage.getItem(UNITS_KEY) === 'imperial' ? 'imperial' : 'metric');

/** Metric or imperial, kept in this browser for every System and every tab; metric on the server. */
export function useUnits(): { units: UnitSystem; setUnits: (u: UnitSystem) => void } {
  const units = useSyncExternalStore(subscribeUnits, readUnits, () => 'metric' as UnitSystem);
  const setUnits = useCallback((u: UnitSystem) => {
    window.localStorage.setItem(UNITS_KEY, u);
    window.dispatchEvent(new Event(UNITS_EVENT));
  }, []);
  return { units, setUnits };
}
