import { strToU8, zipSync } from 'fflate';
import { pointsEntryName, ZIP_MAIN_ENTRY, type SystemFile, type WorkspaceFile } from '@/lib/validations/workspace-transfer';

/** A transfer file is plain JSON up to this size; a larger one goes out as a zip (the measurements' points apart). */
const ZIP_ABOVE_BYTES = 8 * 1024 * 1024;

export interface TransferDownload {
  fileName: string;
  contentType: string;
  body: Uint8Array;
}

/** An ASCII file-name part from a name ("Larkspur AV" → "larkspur-av"); the name itself stays verbatim inside the file. */
function slug(name: string, fallback: string): string {
  return (
    name
      .normalize('NFKD')
      .replace(/[^A-Za-z0-9]+/g, '-')
      .replace(/^-+|-+$/g, '')
      .toLowerCase()
      .slice(0, 60)
      .replace(/-+$/, '') || fallback
  );
}

/**
 * The download of a transfer file, `seamline-<name>-<date>.json`, or `.zip` when the JSON passes {@link ZIP_ABOVE_BYTES}:
 * then the zip holds `workspace.json` (or `system.json`) with each measurement's `points` replaced by `pointsFile`, the
 * name of the zip entry that holds them (`measurements/<key>.json`).
 */
export function transferDownload(file: WorkspaceFile | SystemFile, name: string): TransferDownload {
  const base = `seamline-${slug(name, file.format === 'seamline-workspace' ? 'workspace' : 'system')}-${file.exportedAt.slice(0, 10)}`;
  const json = strToU8(JSON.stringify(file));
  if (json.byteLength <= ZIP_ABOVE_BYTES) return { fileName: `${base}.json`, contentType: 'application/json; charset=utf-8', body: json };
  const entries: Record<string, Uint8Array> = {};
  const measurements = file.measurements.map(({ points, ...m }) => {
    const entry = pointsEntryName(m.key);
    entries[entry] = strToU8(JSON.stringify(points));
    return { ...m, pointsFile: entry };
  });
  // The main entry first, so a reader meets it before the points it names.
  const zip = zipSync({ [ZIP_MAIN_ENTRY[file.format]]: strToU8(JSON.stringify({ ...file, measurements })), ...entries }, { level: 6 });
  return { fileName: `${base}.zip`, contentType: 'application/zip', body: zip };
}

/** The download as an HTTP answer: an attachment with its file name, never cached. */
export function transferResponse(download: TransferDownload): Response {
  return new Response(download.body as Uint8Array<ArrayBuffer>, {
    headers: { 'Content-Type': download.contentType, 'Content-Disposition': `attachment; filename="${download.fileName}"`, 'Cache-Control': 'no-store' },
  });
}
