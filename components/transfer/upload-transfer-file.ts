import { postWithProgress } from '@/lib/client/post-with-progress';
import type { TransferImportAnswer } from '@/lib/data/workspace-import';

/** A zip by its name or type; anything else goes as JSON (the server tells a zip by its first bytes either way). */
const isZipFile = (file: File) => /\.zip$/i.test(file.name) || /zip/i.test(file.type);

/**
 * Sends a transfer file as the request body with XMLHttpRequest, so the page can show upload progress (fetch cannot).
 * Resolves with the 201 answer; rejects with an ApiError (a refusal's issues name the part and field).
 */
export function uploadTransferFile(url: string, file: File, onProgress: (fraction: number) => void): Promise<TransferImportAnswer> {
  return postWithProgress<TransferImportAnswer>(url, file, {
    contentType: isZipFile(file) ? 'application/zip' : 'application/json',
    onProgress,
    networkMessage: 'Could not reach Seamline. Check the connection; nothing was changed.',
    failureMessage: (status) => `The import failed (${status}); nothing was changed.`,
  });
}
