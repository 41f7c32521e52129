import { LAYOUT_TEMPLATES } from '@/dsp';
import { measurementRoleKind } from '@/lib/system-model/measured';
import type { SystemDocument } from '@/lib/validations/system';

/** One measurement as the seat × source table and the Compare and extension panels show it. */
export interface RunItem {
  id: string;
  name: string;
  seat: string | null;
  role: string | null;
  runLabel: string | null;
  /** ISO time it was saved; null for a curve used on this page only. */
  createdAt: string | null;
  sourceFormat: 'text' | 'wav';
  startHz: number;
  stopHz: number;
  /** Used on this page only, not saved. */
  local: boolean;
}

/** A column of the table: a main channel as the layout names it, a sub by name, or a role found in the measurements. */
export interface SourceColumn {
  key: string;
  /** Short heading: the channel label (L, C…), the sub's name, or the role as typed. */
  label: string;
  /** A longer description: "Front left", "Sub", "Mains and subs playing together"… */
  title: string;
  kind: 'mains' | 'sub' | 'sum' | null;
  /** True for the System's own channels and subs (always shown, gaps and all). */
  ofSystem: boolean;
}

export interface SeatRow {
  key: string;
  label: string;
  ofSystem: boolean;
}

export interface RunGrid {
  rows: SeatRow[];
  columns: SourceColumn[];
  /** Runs by `${row.key}|${column.key}`, oldest first. */
  cells: ReadonlyMap<string, RunItem[]>;
}

const NO_SEAT = 'no-seat';
const norm = (text: string) => text.trim().toLowerCase();

/** The System's own columns: each main channel (named as its layout names it), then each sub by name. */
function systemColumns(doc: SystemDocument): SourceColumn[] {
  const template = LAYOUT_TEMPLATES.find((t) => t.id === doc.layout);
  const channels = doc.speakers.map((s): SourceColumn => ({
    key: `ch:${norm(s.channel)}`,
    label: s.channel,
    title: template?.channels.find((c) => c.label === s.channel)?.name ?? `Channel ${s.channel}`,
    kind: 'mains',
    ofSystem: true,
  }));
  const subs = doc.subs.map((s): SourceColumn => ({ key: `sub:${norm(s.name)}`, label: s.name, title: 'Sub', kind: 'sub', ofSystem: true }));
  return [...channels, ...subs];
}

/** The column a measurement's role puts it in (a channel label or a sub's name, ignoring case; else by what was playing). */
export function sourceColumnOf(doc: SystemDocument, role: string | null): SourceColumn {
  const own = systemColumns(doc);
  if (role && role.trim()) {
    const byName = own.find((c) => norm(c.label) === norm(role));
    if (byName) return byName;
  }
  const kind = measurementRoleKind(role);
  if (kind === null) return { key: 'none', label: 'No source', title: 'No source given (set one with Edit)', kind: null, ofSystem: false };
  if (kind === 'sum') return { key: 'sum', label: 'sum', title: 'Mains and subs playing together', kind, ofSystem: false };
  const r = (role ?? '').trim();
  if (kind === 'sub' && /^subs?$/i.test(r)) {
    // One sub: "sub" is that sub; several: the subs together, or one not named.
    const onlySub = doc.subs.length === 1 ? own.find((c) => c.kind === 'sub') : undefined;
    return onlySub ?? { key: 'role:sub', label: 'sub', title: 'Role “sub”: the subs together, or a sub not named', kind, ofSystem: false };
  }
  if (kind === 'mains' && /^mains?$/i.test(r)) return { key: 'role:mains', label: 'mains', title: 'Role “mains”: a main speaker whose channel is not named', kind, ofSystem: false };
  return { key: `role:${norm(r)}`, label: r, title: `Role “${r}”`, kind, ofSystem: false };
}

/** The row a measurement's seat puts it in: a System seat by name (ignoring case), another seat name as typed, or "No seat". */
function seatRowOf(doc: SystemDocument, seat: string | null): SeatRow {
  if (!seat || !seat.trim()) return { key: NO_SEAT, label: 'No seat', ofSystem: false };
  const own = doc.seats.find((s) => norm(s.name) === norm(seat));
  return own ? { key: `seat:${norm(own.name)}`, label: own.name, ofSystem: true } : { key: `seat:${norm(seat)}`, label: seat.trim(), ofSystem: false };
}

/**
 * Groups runs by seat (rows: the System's seats by name, then other seat names found, then "No seat") and source
 * (columns: the System's main channels and subs, then "mains", "sub", "sum" and other roles found), oldest first.
 */
export function runGrid(doc: SystemDocument, runs: readonly RunItem[]): RunGrid {
  const rows = new Map<string, SeatRow>(doc.seats.map((s) => [`seat:${norm(s.name)}`, { key: `seat:${norm(s.name)}`, label: s.name, ofSystem: true }]));
  const columns = new Map<string, SourceColumn>(systemColumns(doc).map((c) => [c.key, c]));
  const cells = new Map<string, RunItem[]>();
  const ordered = [...runs].sort((a, b) => (a.createdAt ?? '\uffff').localeCompare(b.createdAt ?? '\uffff'));
  for (const run of ordered) {
    const row = seatRowOf(doc, run.seat);
    const column = sourceColumnOf(doc, run.role);
    if (!rows.has(row.key) && row.key !== NO_SEAT) rows.set(row.key, row);
    if (!columns.has(column.key)) columns.set(column.key, column);
    const key = `${row.key}|${column.key}`;
    cells.set(key, [...(cells.get(key) ?? []), run]);
  }
  const rowList = [...rows.values()];
  if (runs.some((r) => seatRowOf(doc, r.seat).key === NO_SEAT)) rowList.push({ key: NO_SEAT, label: 'No seat', ofSystem: false });
  return { rows: rowList, columns: [...columns.values()], cells };
}

/** A run's short description: its run label (or name) and its seat, e.g. "Placement: Near a wall · Row 1 centre (MLP)". */
export function runCaption(run: RunItem): string {
  return [run.runLabel ?? run.name, run.seat].filter(Boolean).join(' · ');
}
