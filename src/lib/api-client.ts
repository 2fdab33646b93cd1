export type ApiIssue = { path: string; message: string };

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
}

let csrfToken: string | undefined;
export const setCsrfToken = (token: string | undefined) => {
  csrfToken = token;
};

let onUnauthenticated: () => void = () => {};
export const setUnauthenticatedHandler = (fn: () => void) => {
  onUnauthenticated = fn;
};

type Options = { method?: string; body?: unknown; signal?: AbortSignal; quiet401?: boolean };

export async function apiFetch<T>(url: string, { method = 'GET', body, signal, quiet401 }: Options = {}): Promise<T> {
  const headers: Record<string, string> = { Accept: 'application/json' };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  if (csrfToken && method !== 'GET') headers['X-CSRF-Token'] = csrfToken;
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers,
      body: body === undefined ? undefined : JSON.stringify(body),
      credentials: 'same-origin',
      signal,
    });
  } catch (err) {
    if ((err as Error).name === 'AbortError') throw err;
    throw new ApiError(0, 'network', 'The server could not be reached. Check your connection and try again.');
  }
  if (res.status === 204) return undefined as T;
  const data = await res.json().catch(() => ({}));
  if (!res.ok) {
    if (res.status === 401 && !quiet401) onUnauthenticated();
    throw new ApiError(res.status, data.code ?? 'error', data.message ?? `The server answered ${res.status}`, data.issues ?? [], data);
  }
  return data as T;
}

export function issueFor(error: unknown, path: string): string | undefined {
  return error instanceof ApiError ? error.issues.find((i) => i.path === path)?.message : undefined;
}
