import type { Sequelize } from 'sequelize';

/** One table's content: its row count, a checksum of every row, and the rows (each as PostgreSQL's text form of the row). */
export interface TableState {
  count: number;
  checksum: string;
  rows: string[];
}

/**
 * Every base table of the database's public schema but those in `skip`, by name: equal states mean equal content
 * (the checksum is an md5 of the rows' text forms, sorted, so row order on disk does not matter).
 * Used by the hostile-input test (nothing changed) and the backup test (a restore gives back every row).
 */
export async function tableStates(db: Sequelize, skip: ReadonlySet<string> = new Set()): Promise<Map<string, TableState>> {
  const tables = (await db.query("SELECT table_name AS name FROM information_schema.tables WHERE table_schema = 'public' AND table_type = 'BASE TABLE' ORDER BY 1", { type: 'SELECT' })) as { name: string }[];
  const out = new Map<string, TableState>();
  for (const { name } of tables) {
    if (skip.has(name)) continue;
    const q = `"${name.replaceAll('"', '""')}"`;
    const [sum] = (await db.query(`SELECT count(*)::int AS count, md5(coalesce(string_agg(t::text, E'\\n' ORDER BY t::text), '')) AS checksum FROM ${q} t`, { type: 'SELECT' })) as { count: number; checksum: string }[];
    const rows = ((await db.query(`SELECT t::text AS row FROM ${q} t ORDER BY 1`, { type: 'SELECT' })) as { row: string }[]).map((r) => r.row);
    out.set(name, { count: sum!.count, checksum: sum!.checksum, rows });
  }
  return out;
}
