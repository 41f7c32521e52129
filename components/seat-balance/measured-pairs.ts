import type { SeatBalanceMeasurementRef } from '@/lib/system-model/seat-balance-document';

/** Which stored files Seat balance looks through: those uploaded for this System, or any in its workspace. */
export type MeasurementScope = 'system' | 'workspace';

/**
 * The list handed to the request builder, which takes the first match per sub and seat: with scope 'system' only the
 * files uploaded for this System; with 'workspace' every file, this System's first (each part newest first as listed),
 * so a copy of a System can use the files of the one it was copied from.
 */
export function measurementsInScope<T extends SeatBalanceMeasurementRef & { systemId: string | null }>(items: readonly T[], systemId: string, scope: MeasurementScope): T[] {
  const own = items.filter((m) => m.systemId === systemId);
  return scope === 'system' ? own : [...own, ...items.filter((m) => m.systemId !== systemId)];
}

type PairStatus = { kind: 'ok' } | { kind: 'missing' } | { kind: 'no-phase'; file: string };

/** One row per sub, one cell per seat: whether a usable file was found, none, or only files without phase. */
export function pairStatusGrid(
  subs: readonly string[],
  seats: readonly string[],
  missing: readonly { sub: string; seat: string }[],
  withoutPhase: readonly { sub: string; seat: string; name: string }[],
): { sub: string; cells: { seat: string; status: PairStatus }[] }[] {
  return subs.map((sub) => ({
    sub,
    cells: seats.map((seat) => {
      const noPhase = withoutPhase.find((w) => w.sub === sub && w.seat === seat);
      if (noPhase) return { seat, status: { kind: 'no-phase', file: noPhase.name } };
      if (missing.some((m) => m.sub === sub && m.seat === seat)) return { seat, status: { kind: 'missing' } };
      return { seat, status: { kind: 'ok' } };
    }),
  }));
}
