/**
 * The browser's one way to call the JSON API (app/api): every form, button and SWR
 * fetcher goes through here. Bodies are sent as JSON with `Content-Type:
 * application/json` (the API refuses a body without it); the answer is the data, or
 * the API's `{ error: { field, message } }` for the form to show beside its field.
 * Pure: no React, no server code, so any client component may import it.
 */

export interface FormError {
  field?: string;
  message: string;
}

export type Sent<T> =
  { ok: true; status: number; data: T } | { ok: false; status: number; error: FormError; body: unknown };

export type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export const UNREACHABLE = 'Clackwater could not be reached. Check your connection and try again.';

/**
 * Sends `body` (when given) as JSON and reads the JSON answer. Never throws: a network
 * failure, or an abort through `signal`, answers `{ ok: false, status: 0 }` (callers
 * that abort check `signal.aborted` before using it). `body` on a refusal is the whole
 * answer, for the few forms that show more than the message (an import's row errors).
 */
export async function sendJson<T = unknown>(
  url: string,
  method: Method,
  body?: unknown,
  init: { signal?: AbortSignal; headers?: Record<string, string> } = {},
): Promise<Sent<T>> {
  let res: Response;
  try {
    res = await fetch(url, {
      method,
      headers: {
        accept: 'application/json',
        ...(body === undefined ? {} : { 'content-type': 'application/json' }),
        ...init.headers,
      },
      body: body === undefined ? undefined : JSON.stringify(body),
      signal: init.signal,
    });
  } catch {
    return { ok: false, status: 0, error: { message: UNREACHABLE }, body: null };
  }
  const json = (await res.json().catch(() => null)) as { error?: Partial<FormError> } | null;
  if (res.ok) return { ok: true, status: res.status, data: json as T };
  const message =
    typeof json?.error?.message === 'string' ? json.error.message : `Something went wrong (${res.status}).`;
  const field = typeof json?.error?.field === 'string' ? json.error.field : undefined;
  return { ok: false, status: res.status, error: field === undefined ? { message } : { field, message }, body: json };
}

/** A refused GET, for SWR's `error`: the API's message and the status. */
export class RequestError extends Error {
  constructor(
    readonly status: number,
    message: string,
  ) {
    super(message);
    this.name = 'RequestError';
  }
}

/** SWR's fetcher: the data, or a RequestError carrying the API's message. */
export async function getJson<T = unknown>(url: string): Promise<T> {
  const r = await sendJson<T>(url, 'GET');
  if (!r.ok) throw new RequestError(r.status, r.error.message);
  return r.data;
}

/** SWR's fetcher where a refusal simply means "nothing to show" (related threads, a moderator's view). */
export async function getJsonOrNull<T = unknown>(url: string): Promise<T | null> {
  const r = await sendJson<T>(url, 'GET');
  return r.ok ? r.data : null;
}
