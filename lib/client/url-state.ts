import { compressToEncodedURIComponent, decompressFromEncodedURIComponent } from 'lz-string';
import { systemDocumentSchema, type SystemDocument } from '@/lib/validations/system';

/** The anonymous editor keeps its whole document in the URL (`?s=`), compressed with lz-string. */
export const URL_STATE_PARAM = 's';

export function encodeDocument(doc: SystemDocument): string {
  return compressToEncodedURIComponent(JSON.stringify(doc));
}

/** The document in `encoded`, or null with the reason when it is missing, damaged or invalid. */
export function decodeDocument(encoded: string | null | undefined): { doc: SystemDocument | null; problem: string | null } {
  if (!encoded) return { doc: null, problem: null };
  let raw: unknown;
  try {
    const text = decompressFromEncodedURIComponent(encoded);
    if (!text) return { doc: null, problem: 'The link is damaged (it could not be unpacked); a fresh System was opened instead.' };
    raw = JSON.parse(text);
  } catch {
    return { doc: null, problem: 'The link is damaged (it is not a System); a fresh System was opened instead.' };
  }
  const parsed = systemDocumentSchema.safeParse(raw);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    return { doc: null, problem: `The link holds a System that is not valid (${first ? `${first.path.join('.')}: ${first.message}` : 'unknown problem'}); a fresh System was opened instead.` };
  }
  return { doc: parsed.data, problem: null };
}
