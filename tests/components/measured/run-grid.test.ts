import { describe, expect, it } from 'vitest';
import { runGrid, sourceColumnOf, type RunItem } from '@/components/measured/run-grid';
import { juniperLaneDocument, lindenStreetDocument } from '@/lib/demo/systems';

// The seat × source table's grouping, checked against the invented demo rooms (lib/demo/systems.ts) by hand.
let n = 0;
const run = (seat: string | null, role: string | null, createdAt: string | null = new Date(Date.UTC(2026, 0, 1) + ++n * 60_000).toISOString()): RunItem => ({
  id: `r${++n}`,
  name: `run ${n}`,
  seat,
  role,
  runLabel: null,
  createdAt,
  sourceFormat: 'text',
  startHz: 10,
  stopHz: 20000,
  local: createdAt === null,
});

describe('runGrid (the Measured tab’s seat × source table)', () => {
  it('columns are the layout’s channels by name, then each sub, then roles found; rows the System’s seats, other seats, then “No seat”', () => {
    const doc = juniperLaneDocument();
    const runs = [run('row 1 centre (mlp)', 'c'), run('Kitchen', 'Sub front left'), run(null, 'mains'), run('Row 1 left', 'sub'), run('Row 1 left', 'L + sub'), run('Row 1 right', null)];
    const grid = runGrid(doc, runs);
    expect(grid.columns.slice(0, 11).map((c) => c.label)).toEqual(['L', 'C', 'R', 'SL', 'SR', 'SBL', 'SBR', 'TFL', 'TFR', 'TRL', 'TRR']);
    // 7.1.4's names for its channels (dsp/layout/layout-templates.ts).
    expect(grid.columns.find((c) => c.label === 'C')?.title).toBe('Centre');
    expect(grid.columns.find((c) => c.label === 'SL')?.title).toBe('Side surround left');
    expect(grid.columns.slice(11, 13).map((c) => c.label)).toEqual(['Sub front left', 'Sub right wall']);
    expect(grid.columns.slice(13).map((c) => c.key)).toEqual(['role:mains', 'role:sub', 'sum', 'none']);
    expect(grid.rows.map((r) => r.label)).toEqual(['Row 1 left', 'Row 1 centre (MLP)', 'Row 1 right', 'Kitchen', 'No seat']);
    expect(grid.cells.get('seat:row 1 centre (mlp)|ch:c')?.map((r) => r.id)).toEqual([runs[0]!.id]);
    expect(grid.cells.get('seat:kitchen|sub:sub front left')?.length).toBe(1);
    expect(grid.cells.get('no-seat|role:mains')?.length).toBe(1);
    expect(grid.cells.get('seat:row 1 left|sum')?.length).toBe(1);
    expect(grid.cells.get('seat:row 1 left|ch:c')).toBeUndefined();
  });

  it('several runs in a cell are listed oldest first, runs used on this page only last', () => {
    const doc = juniperLaneDocument();
    const local = run('Row 1 left', 'C', null);
    const newer = run('Row 1 left', 'C', '2026-03-01T00:00:00.000Z');
    const older = run('Row 1 left', 'C', '2026-02-01T00:00:00.000Z');
    expect(runGrid(doc, [local, newer, older]).cells.get('seat:row 1 left|ch:c')?.map((r) => r.id)).toEqual([older.id, newer.id, local.id]);
  });

  it('with one sub, the role “sub” is that sub; with several, a column of its own', () => {
    expect(sourceColumnOf(lindenStreetDocument(), 'sub').key).toBe('sub:sub');
    expect(sourceColumnOf(juniperLaneDocument(), 'SUB').key).toBe('role:sub');
    expect(sourceColumnOf(juniperLaneDocument(), 'LFE')).toMatchObject({ key: 'role:lfe', kind: 'sub' });
    expect(sourceColumnOf(juniperLaneDocument(), 'FWL')).toMatchObject({ key: 'role:fwl', kind: 'mains', ofSystem: false });
  });
});
