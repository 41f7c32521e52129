import { ApiError, type ApiIssue } from '@/lib/client/api';
import type { TransferImportAnswer } from '@/lib/data/workspace-import';

/** A zip by its name or type; anything else goes as JSON (the server tells a zip by its first bytes either way). */
const isZipFile = (file: File) => /\.zip$/i.test(file.name) || /zip/i.test(file.type);

/**
 * Sends a transfer file as the request body with XMLHttpRequest, so the page can show upload progress (fetch cannot).
 * Resolves with the 201 answer; rejects with an ApiError (a refusal's issues name the part and field).
 */
export function uploadTransferFile(url: string, file: File, onProgress: (fraction: number) => void): Promise<TransferImportAnswer> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    xhr.setRequestHeader('Content-Type', isZipFile(file) ? 'application/zip' : 'application/json');
    xhr.responseType = 'text';
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', 'Could not reach Seamline. Check the connection; nothing was changed.'));
    xhr.onload = () => {
      let body: unknown = null;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : null;
      } catch {
        body = null;
      }
      if (xhr.status === 201) {
        resolve(body as TransferImportAnswer);
        return;
      }
      const err = (body as { error?: { code?: string; message?: string; issues?: ApiIssue[] } } | null)?.error;
      reject(new ApiError(xhr.status, err?.code ?? 'error', err?.message ?? `The import failed (${xhr.status}); nothing was changed.`, err?.issues ?? [], (err ?? {}) as Record<string, unknown>));
    };
    xhr.send(file);
  });
}
