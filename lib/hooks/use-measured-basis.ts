'use client';

import { usePathname } from 'next/navigation';
import { useSession } from 'next-auth/react';
import { useMemo, useState } from 'react';
import useSWR from 'swr';
import { useSystem } from '@/components/system/system-context';
import { jsonFetcher, type ApiError } from '@/lib/client/api';
import { measuredSeats, type SeatBasis } from '@/lib/system-model/measured-picks';
import type { MeasurementItem } from './use-measurements';

const SYSTEM_PATH = /^\/systems\/([0-9a-f-]{36})(?:\/|$)/i;

/** What a decision runs on: the model, or the measurements at one seat. */
export interface MeasuredBasisState {
  /** The seat chosen, or null for the model. */
  seat: SeatBasis | null;
  /** Seats whose measurements cover the channel and every sub. */
  seats: SeatBasis[];
  /** Why other seats cannot be used, and why none can (signed out, unsaved System, nothing measured). */
  gaps: string[];
  unavailable: string | null;
  choose: (seat: string | null) => void;
  /** The label every plot and table of the decision carries: "the model" or "the measurements at Row 1 centre". */
  label: string;
}

/**
 * The one control's state for running Timing and the Crossover sweep on measurements: the saved System's own
 * measurements (GET /api/v1/measurements?systemId=), grouped by seat into the picks the API takes.
 */
export function useMeasuredBasis(channel: string | undefined): MeasuredBasisState {
  const { doc } = useSystem();
  const { status } = useSession();
  const systemId = usePathname().match(SYSTEM_PATH)?.[1] ?? null;
  const key = status === 'authenticated' && systemId ? `/api/v1/measurements?systemId=${systemId}` : null;
  const list = useSWR<{ items: MeasurementItem[] }, ApiError>(key, jsonFetcher, { revalidateOnFocus: false });
  const [chosen, setChosen] = useState<string | null>(null);
  const { seats, gaps } = useMemo(() => measuredSeats(doc, list.data?.items ?? [], channel), [doc, list.data, channel]);
  const seat = seats.find((s) => s.seat === chosen) ?? null;
  const unavailable = !systemId
    ? 'Save this System and upload measurements for it to run on what was measured.'
    : status !== 'authenticated'
      ? 'Sign in to use this System’s measurements.'
      : list.error
        ? `The measurements could not be listed: ${list.error.message}`
        : seats.length === 0 && list.data
          ? 'No seat has both a measurement of the mains alone and of the subs for this System (Measured tab).'
          : null;
  return { seat, seats, gaps, unavailable, choose: setChosen, label: seat ? `the measurements at ${seat.seat}` : 'the model' };
}
