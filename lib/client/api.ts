/** Client-side JSON calls that turn the API's error bodies (`{ error: { code, message, issues } }`) into a typed ApiError. */
export interface ApiIssue {
  path: string;
  message: string;
}

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly issues: ApiIssue[] = [],
    readonly body: Record<string, unknown> = {},
  ) {
    super(message);
  }
  /** The message for one field (by its path, e.g. "email" or "paths.1.filter.order"). */
  field(path: string): string | undefined {
    return this.issues.find((i) => i.path === path || i.path.startsWith(`${path}.`))?.message;
  }
}

export async function apiFetch<T>(url: string, init: RequestInit & { json?: unknown } = {}): Promise<T> {
  const { json, ...rest } = init;
  let res: Response;
  try {
    res = await fetch(url, {
      ...rest,
      headers: { ...(json !== undefined ? { 'Content-Type': 'application/json' } : {}), ...(rest.headers ?? {}) },
      body: json !== undefined ? JSON.stringify(json) : rest.body,
    });
  } catch {
    throw new ApiError(0, 'network', 'Could not reach Seamline. Check the connection; nothing was changed.');
  }
  const text = await res.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = null;
  }
  if (!res.ok) {
    const err = (body as { error?: { code?: string; message?: string; issues?: ApiIssue[] } } | null)?.error;
    throw new ApiError(res.status, err?.code ?? 'error', err?.message ?? `The request failed (${res.status}).`, err?.issues ?? [], (err ?? {}) as Record<string, unknown>);
  }
  return body as T;
}

export const jsonFetcher = <T,>(url: string) => apiFetch<T>(url);
