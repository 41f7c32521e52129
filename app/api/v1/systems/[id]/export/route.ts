import { requireCaller } from '@/lib/auth';
import { getSystem } from '@/lib/data/systems';
import { parseQuery, route } from '@/lib/http';
import { settingsSheetCsv } from '@/lib/system-model/settings-sheet';
import { exportQuerySchema } from '@/lib/validations/library';

type Ctx = { params: Promise<{ id: string }> };

/** A file of the System: `?format=json` (the document, with name and revision) or `?format=csv` (the Settings sheet). */
export const GET = route<Ctx>(async (request, { params }) => {
  const caller = await requireCaller();
  const { id } = await params;
  const { format } = parseQuery(request, exportQuerySchema);
  const system = await getSystem(caller, id);
  const base = fileBase(system.name, system.revision);
  if (format === 'csv') {
    return new Response(settingsSheetCsv(system.name, system.revision, system.document), {
      headers: { 'Content-Type': 'text/csv; charset=utf-8', 'Content-Disposition': `attachment; filename="${base}.csv"`, 'Cache-Control': 'no-store' },
    });
  }
  const body = JSON.stringify({ name: system.name, revision: system.revision, updatedAt: system.updatedAt, document: system.document }, null, 2);
  return new Response(body, {
    headers: { 'Content-Type': 'application/json; charset=utf-8', 'Content-Disposition': `attachment; filename="${base}.json"`, 'Cache-Control': 'no-store' },
  });
});

/** An ASCII file name from the System's name (the name itself stays verbatim inside the file). */
function fileBase(name: string, revision: number): string {
  const slug = name.normalize('NFKD').replace(/[^A-Za-z0-9]+/g, '-').replace(/^-+|-+$/g, '').toLowerCase().slice(0, 60) || 'system';
  return `${slug}-r${revision}`;
}
