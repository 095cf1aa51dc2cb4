/** JSON calls from the thread's client components; the error is the API's plain message. */
export async function call<T = unknown>(method: 'GET' | 'POST' | 'PUT' | 'DELETE', url: string, body?: unknown): Promise<{ ok: true; data: T } | { ok: false; message: string; field?: string }> {
  try {
    const res = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { 'content-type': 'application/json' },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const json = await res.json().catch(() => ({}));
    if (res.ok) return { ok: true, data: json as T };
    return { ok: false, message: json?.error?.message ?? `Something went wrong (${res.status}).`, field: json?.error?.field };
  } catch {
    return { ok: false, message: 'Clackwater could not be reached. Check your connection and try again.' };
  }
}
