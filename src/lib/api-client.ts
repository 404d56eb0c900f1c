// Fetch wrapper: JSON in and out, the CSRF token on state-changing requests, errors as ApiError.

export interface FieldIssue {
  path: string;
  message: string;
}

/** What the app says while the server cannot reach its database (503 database_unavailable). */
export const DATABASE_UNREACHABLE = 'The database is unreachable; retrying…';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details: unknown,
    /** seconds the server asked to wait before trying again (Retry-After), when it said */
    readonly retryAfterSeconds: number | null = null,
  ) {
    super(message);
  }
  get fieldIssues(): FieldIssue[] {
    return Array.isArray(this.details) ? (this.details as FieldIssue[]) : [];
  }
  /** the server is up but its database is not: nothing was read or saved, and the same request may be sent again */
  get databaseUnavailable(): boolean {
    return this.status === 503 && this.code === 'database_unavailable';
  }
}

/** Whether an error (of a query or a mutation) is the database being unreachable. */
export function isDatabaseUnavailable(err: unknown): err is ApiError {
  return err instanceof ApiError && err.databaseUnavailable;
}

function retryAfter(res: Response): number | null {
  const v = Number(res.headers.get('retry-after'));
  return Number.isFinite(v) && v > 0 ? v : null;
}

let csrf: string | null = null;

export function setCsrfToken(token: string | null) {
  csrf = token;
}

async function ensureCsrf(): Promise<string> {
  if (!csrf) {
    const r = await fetch('/api/auth/csrf', { credentials: 'same-origin' });
    csrf = ((await r.json()) as { token: string }).token;
  }
  return csrf;
}

async function toError(res: Response): Promise<ApiError> {
  try {
    const body = (await res.json()) as { error?: { code: string; message: string; details: unknown } };
    if (body.error) return new ApiError(res.status, body.error.code, body.error.message, body.error.details, retryAfter(res));
  } catch {
    /* not JSON */
  }
  return new ApiError(res.status, 'http_error', `The server answered ${res.status}`, null, retryAfter(res));
}

export async function api<T>(method: string, url: string, body?: unknown, init: { raw?: boolean } = {}): Promise<T> {
  const headers: Record<string, string> = { accept: 'application/json' };
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !isForm) headers['content-type'] = 'application/json';
  if (method !== 'GET') headers['x-csrf-token'] = await ensureCsrf();
  let res = await fetch(url, {
    method,
    headers,
    credentials: 'same-origin',
    body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
  });
  if (res.status === 403 && method !== 'GET') {
    const err = await toError(res.clone());
    if (err.code === 'csrf_failed') {
      csrf = null;
      headers['x-csrf-token'] = await ensureCsrf();
      res = await fetch(url, {
        method,
        headers,
        credentials: 'same-origin',
        body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
      });
    }
  }
  if (!res.ok) throw await toError(res);
  if (init.raw) return res as unknown as T; // cast: a raw call asks for the Response itself (T is Response there)
  if (res.status === 204) return undefined as T;
  return (await res.json()) as T;
}

export const get = <T>(url: string) => api<T>('GET', url);
export const post = <T>(url: string, body?: unknown) => api<T>('POST', url, body ?? {});
export const patch = <T>(url: string, body: unknown) => api<T>('PATCH', url, body);
export const put = <T>(url: string, body: unknown) => api<T>('PUT', url, body);
export const del = <T>(url: string) => api<T>('DELETE', url);

/** Query string from an object, skipping empty values. */
export function qs(params: Record<string, string | number | boolean | undefined | null>): string {
  const s = new URLSearchParams();
  for (const [k, v] of Object.entries(params)) if (v !== undefined && v !== null && v !== '') s.set(k, String(v));
  const out = s.toString();
  return out ? `?${out}` : '';
}
