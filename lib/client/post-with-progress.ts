import { ApiError, type ApiIssue } from './api';

/**
 * POSTs a body with XMLHttpRequest, so a page can show upload progress (fetch cannot). Resolves with the 201 answer;
 * rejects with an ApiError: the server's error (its issues name the field) or `failureMessage` when it gave none, and
 * `networkMessage` when the server could not be reached.
 */
export function postWithProgress<T>(
  url: string,
  body: XMLHttpRequestBodyInit,
  options: { contentType?: string; onProgress: (fraction: number) => void; networkMessage: string; failureMessage: (status: number) => string },
): Promise<T> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    if (options.contentType) xhr.setRequestHeader('Content-Type', options.contentType);
    xhr.responseType = 'text';
    xhr.upload.onprogress = (e) => {
      if (e.lengthComputable && e.total > 0) options.onProgress(e.loaded / e.total);
    };
    xhr.onerror = () => reject(new ApiError(0, 'network', options.networkMessage));
    xhr.onload = () => {
      let answer: unknown = null;
      try {
        answer = xhr.responseText ? JSON.parse(xhr.responseText) : null;
      } catch {
        answer = null;
      }
      if (xhr.status === 201) {
        resolve(answer as T);
        return;
      }
      const err = (answer as { error?: { code?: string; message?: string; issues?: ApiIssue[] } } | null)?.error;
      reject(new ApiError(xhr.status, err?.code ?? 'error', err?.message ?? options.failureMessage(xhr.status), err?.issues ?? [], (err ?? {}) as Record<string, unknown>));
    };
    xhr.send(body);
  });
}
