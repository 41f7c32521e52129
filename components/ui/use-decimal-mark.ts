'use client';

import { useSyncExternalStore } from 'react';
import { decimalMarkFor, type DecimalMark } from '@/lib/number-input';

const noSubscription = () => () => {};

/** The browser locale's decimal mark ("," in e.g. de-DE); "." on the server and while hydrating, so both render alike. */
export function useDecimalMark(): DecimalMark {
  return useSyncExternalStore(
    noSubscription,
    () => decimalMarkFor(typeof navigator === 'undefined' ? undefined : navigator.language),
    () => '.',
  );
}
