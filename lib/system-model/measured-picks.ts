/**
 * Which stored measurements a decision runs on at each seat: for the shown main channel, the newest measurement of it
 * alone ("mains" or the channel's label, one with phase first); for the subs, each sub alone (role = the sub's name)
 * when every sub has one, else the newest of every sub together (role "sub"). Pure: the list comes from the API.
 */
import type { SystemDocument } from '@/lib/validations/system';
import { measurementRoleKind } from './measured';
import type { MeasuredPicks } from './measured-sources';

/** What the picker needs of a listed measurement (newest first, as the API lists them). */
export interface PickableMeasurement {
  id: string;
  name: string;
  seat: string | null;
  role: string | null;
  runLabel: string | null;
  hasPhase: boolean;
}

/** A seat whose measurements can stand for the whole system. */
export interface SeatBasis {
  seat: string;
  mains: PickableMeasurement;
  subs: { kind: 'each'; items: PickableMeasurement[] } | { kind: 'all'; item: PickableMeasurement };
  picks: MeasuredPicks;
  /** The files it runs on, in words ("L mains (treble +2); Sub A alone, Sub B alone"). */
  files: string;
}

const same = (a: string | null | undefined, b: string | null | undefined) => (a ?? '').trim().toLowerCase() === (b ?? '').trim().toLowerCase();
const label = (m: PickableMeasurement) => (m.runLabel ? `${m.name} (${m.runLabel})` : m.name);

/** The seats whose measurements cover the channel and every sub, and for the others what is missing. */
export function measuredSeats(doc: SystemDocument, items: readonly PickableMeasurement[], channel: string | undefined): { seats: SeatBasis[]; gaps: string[] } {
  const seatNames: string[] = [];
  for (const m of items) if (m.seat && m.seat.trim() && !seatNames.some((s) => same(s, m.seat))) seatNames.push(m.seat.trim());
  const seats: SeatBasis[] = [];
  const gaps: string[] = [];
  for (const seat of seatNames) {
    const here = items.filter((m) => same(m.seat, seat));
    const mainsKind = here.filter((m) => measurementRoleKind(m.role) === 'mains' && (same(m.role, 'mains') || same(m.role, channel)));
    const mains = [...mainsKind].sort((a, b) => Number(same(b.role, channel)) - Number(same(a.role, channel)) || Number(b.hasPhase) - Number(a.hasPhase))[0];
    const alone = doc.subs.map((s) => here.find((m) => measurementRoleKind(m.role) === 'sub' && same(m.role, s.name)));
    const together = here.find((m) => measurementRoleKind(m.role) === 'sub' && !doc.subs.some((s) => same(m.role, s.name)));
    const oneSub = doc.subs.length === 1 ? (alone[0] ?? together) : undefined;
    const each = oneSub ? [oneSub] : alone.every((m): m is PickableMeasurement => m !== undefined) && alone.length > 0 ? alone : null;
    if (!mains || (!each && !together)) {
      gaps.push(`${seat}: ${!mains ? `no measurement of ${channel ?? 'the mains'} alone` : 'no measurement of the subs'}`);
      continue;
    }
    const subs: SeatBasis['subs'] = each ? { kind: 'each', items: each } : { kind: 'all', item: together! };
    seats.push({
      seat,
      mains,
      subs,
      picks: {
        mains: { measurementId: mains.id },
        subs: subs.kind === 'each' ? { kind: 'each', curves: subs.items.map((m) => ({ measurementId: m.id })) } : { kind: 'all', curve: { measurementId: subs.item.id } },
      },
      files: [label(mains), ...(subs.kind === 'each' ? subs.items.map(label) : [`${label(subs.item)} (every sub together)`])].join('; '),
    });
  }
  return { seats, gaps };
}
