import type { ApiErrorBody } from '../../shared/errors';

/** An API error with the server's code, message and per-field messages. */
export class ApiError extends Error {
  constructor(
    public status: number,
    public code: string,
    message: string,
    public fieldErrors: Record<string, string[]> = {},
    /** The server's id for this request (X-Request-Id), for a buyer to quote to the mill. */
    public requestId?: string,
  ) {
    super(message);
  }
}

/** Reads the request id the server put on a response. */
export const requestIdOf = (res: Response) => res.headers.get('X-Request-Id') ?? undefined;

/** Plain words for the statuses a person can meet. */
export function friendlyMessage(error: unknown): string {
  if (error instanceof ApiError) {
    if (error.status === 401) return error.message || 'Please sign in to continue.';
    if (error.status === 403) return error.message || 'Your account cannot do this.';
    if (error.status === 429) return error.message || 'Too many tries. Please wait a minute and try again.';
    if (error.status >= 500) {
      return `Something went wrong on our side. Please try again in a moment.${error.requestId ? ` If it keeps happening, tell the mill reference ${error.requestId}.` : ''}`;
    }
    return error.message;
  }
  return 'We could not reach the yard office. Check your connection and try again.';
}

type Options = Omit<RequestInit, 'body'> & { body?: unknown; query?: Record<string, string | number | boolean | undefined | null> };

/** The one way the client calls the API: JSON in and out, cookies included, errors as ApiError. */
export async function apiFetch<T>(path: string, { body, query, headers, ...init }: Options = {}): Promise<T> {
  let url = path;
  if (query) {
    const params = new URLSearchParams();
    for (const [k, v] of Object.entries(query)) if (v !== undefined && v !== null && v !== '') params.set(k, String(v));
    const qs = params.toString();
    if (qs) url += `?${qs}`;
  }
  const isForm = body instanceof FormData;
  const res = await fetch(url, {
    credentials: 'same-origin',
    ...init,
    headers: { Accept: 'application/json', ...(body !== undefined && !isForm ? { 'Content-Type': 'application/json' } : {}), ...headers },
    body: body === undefined ? undefined : isForm ? body : JSON.stringify(body),
  });
  if (res.status === 204) return undefined as T;
  const text = await res.text();
  const data = text ? safeJson(text) : null;
  if (!res.ok) {
    const err = (data as ApiErrorBody | null)?.error;
    // The auth library answers { message, code } rather than our { error } shape.
    const authMessage = data && typeof data === 'object' && 'message' in data ? String((data as { message: unknown }).message) : undefined;
    throw new ApiError(res.status, err?.code ?? 'error', err?.message ?? authMessage ?? res.statusText, err?.fieldErrors ?? {}, requestIdOf(res));
  }
  return data as T;
}

function safeJson(text: string): unknown {
  try { return JSON.parse(text); } catch { return null; }
}
