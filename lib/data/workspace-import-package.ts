import { Unzip, UnzipInflate } from 'fflate';
import { AppError, invalid, unsupportedMedia } from '@/lib/errors';
import { readBodyBytes } from '@/lib/http';
import { IMPORT_LIMIT_BYTES, pointsEntryName, ZIP_MAIN_ENTRY } from '@/lib/validations/workspace-transfer';

/** What a zip may unpack to at most, bytes, and how many entries it may hold: beyond either, it is refused as a zip bomb. */
const UNZIPPED_LIMIT_BYTES = 128 * 1024 * 1024;
const ZIP_ENTRY_LIMIT = 20_001;
/** Compressed bytes fed to the inflater at a time: deflate expands at most ~1032×, so one step stays under ~17 MB. */
const ZIP_STEP_BYTES = 16 * 1024;

const JSON_TYPE = /^application\/(.+\+)?json\b/i;
const ZIP_TYPE = /^application\/(zip|x-zip-compressed|octet-stream)\b/i;
/** A zip starts with a local file header ("PK\3\4") or, empty, with the end of its central directory ("PK\5\6"). */
const isZip = (b: Uint8Array) => b.length >= 4 && b[0] === 0x50 && b[1] === 0x4b && ((b[2] === 3 && b[3] === 4) || (b[2] === 5 && b[3] === 6));

const refused = (path: string, message: string) => invalid(`${path}: ${message}`, [{ path, message }]);
const tooLargeFile = () => new AppError(413, 'too_large', `An import file may be at most ${IMPORT_LIMIT_BYTES / (1024 * 1024)} MB; this one is larger. Nothing was read or changed.`);

function parseJsonText(bytes: Uint8Array, where: string): unknown {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw refused(where, 'not UTF-8 text');
  }
  try {
    return JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text);
  } catch {
    throw refused(where, 'not valid JSON');
  }
}

/** The entries a transfer zip may hold; anything else in it is skipped unread (but counted). */
const WANTED = /^(workspace\.json|system\.json|measurements\/[A-Za-z0-9_-]{1,40}\.json)$/;

/**
 * The wanted entries of a zip, each inflated in small steps so a zip bomb is stopped as soon as the total passes the
 * limit (never inflated whole); too many entries, a truncated or malformed archive and unknown compression are refused.
 */
function unzipBounded(bytes: Uint8Array): Map<string, Uint8Array> {
  const chunks = new Map<string, Uint8Array[]>();
  const done = new Set<string>();
  let total = 0;
  let entries = 0;
  let failure: AppError | null = null;
  const stop = (e: AppError) => (failure ??= e);
  const unzip = new Unzip((file) => {
    if (++entries > ZIP_ENTRY_LIMIT) return void stop(refused('(zip)', `holds more than ${ZIP_ENTRY_LIMIT} entries`));
    if (!WANTED.test(file.name) || chunks.has(file.name)) return;
    const parts: Uint8Array[] = [];
    chunks.set(file.name, parts);
    file.ondata = (error, data, final) => {
      if (error) return void stop(refused(file.name, 'could not be unpacked'));
      total += data.byteLength;
      if (total > UNZIPPED_LIMIT_BYTES) return void stop(refused('(zip)', `unpacks to more than ${UNZIPPED_LIMIT_BYTES / (1024 * 1024)} MB: refused as a zip bomb`));
      parts.push(data);
      if (final) done.add(file.name);
    };
    file.start();
  });
  unzip.register(UnzipInflate);
  try {
    for (let at = 0; at < bytes.length && !failure; at += ZIP_STEP_BYTES) unzip.push(bytes.subarray(at, at + ZIP_STEP_BYTES), at + ZIP_STEP_BYTES >= bytes.length);
  } catch {
    stop(refused('(zip)', 'not a readable zip archive'));
  }
  if (failure) throw failure;
  const out = new Map<string, Uint8Array>();
  for (const [name, parts] of chunks) {
    if (!done.has(name)) throw refused(name, 'the zip ends before this entry does (truncated)');
    out.set(name, Buffer.concat(parts));
  }
  return out;
}

/**
 * A transfer zip as the one JSON value it stands for: its main entry, with each measurement's `pointsFile` replaced
 * by the points that entry holds. A missing entry is refused by the measurement's path.
 */
function fromZip(bytes: Uint8Array): unknown {
  const entries = unzipBounded(bytes);
  const mains = Object.values(ZIP_MAIN_ENTRY).filter((name) => entries.has(name));
  if (mains.length !== 1) throw refused('(zip)', `must hold exactly one of ${Object.values(ZIP_MAIN_ENTRY).join(' or ')}`);
  const main = mains[0] as string;
  const file = parseJsonText(entries.get(main) as Uint8Array, main);
  const measurements = (file as { measurements?: unknown } | null)?.measurements;
  if (!Array.isArray(measurements)) return file;
  measurements.forEach((m: unknown, i) => {
    if (!m || typeof m !== 'object' || !('pointsFile' in m)) return;
    const { pointsFile, ...rest } = m as Record<string, unknown>;
    const key = typeof rest.key === 'string' ? rest.key : '';
    if (pointsFile !== pointsEntryName(key)) throw refused(`measurements.${i}.pointsFile`, `must be "${pointsEntryName(key || '<key>')}"`);
    const entry = entries.get(pointsFile);
    if (!entry) throw refused(`measurements.${i}.pointsFile`, `the zip holds no entry "${pointsFile}"`);
    measurements[i] = { ...rest, points: parseJsonText(entry, pointsFile) };
  });
  return file;
}

/**
 * Reads an import file from the request body: JSON (application/json) or a zip (application/zip, told by its first
 * bytes), at most {@link IMPORT_LIMIT_BYTES} (413 beyond, before parsing); 415 for other media types, 400 for a body
 * that is not what it claims. Answers the parsed value, not yet validated.
 */
export async function readTransferFile(request: Request): Promise<unknown> {
  const type = request.headers.get('content-type') ?? '';
  const json = JSON_TYPE.test(type);
  if (!json && !ZIP_TYPE.test(type)) throw unsupportedMedia('application/json (a .json transfer file) or application/zip (a .zip one)');
  const bytes = await readBodyBytes(request, IMPORT_LIMIT_BYTES, tooLargeFile);
  if (isZip(bytes)) return fromZip(bytes);
  if (!json) throw refused('(body)', 'not a zip archive');
  if (bytes.byteLength === 0) throw refused('(body)', 'empty: send the file');
  return parseJsonText(bytes, '(body)');
}
