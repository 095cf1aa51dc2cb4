/**
 * What the forms share: send JSON to a route handler and get back either the
 * answer or the API's `{ error: { field, message } }`, shown beside its field.
 */
export interface FormError {
  field?: string;
  message: string;
}

export type Sent<T> = { ok: true; data: T } | { ok: false; error: FormError };

export async function sendJson<T = unknown>(url: string, method: 'POST' | 'PUT', body: unknown): Promise<Sent<T>> {
  let res: Response;
  try {
    res = await fetch(url, { method, headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) });
  } catch {
    return { ok: false, error: { message: 'Clackwater could not be reached. Check your connection and try again.' } };
  }
  const json = (await res.json().catch(() => null)) as { error?: FormError } | null;
  if (res.ok) return { ok: true, data: json as T };
  return { ok: false, error: { field: json?.error?.field, message: json?.error?.message ?? `Something went wrong (${res.status}).` } };
}

/** The message for one field, or for the form as a whole when `field` is omitted. */
export function FieldError({ error, field, id }: { error: FormError | null; field?: string; id?: string }) {
  if (!error) return null;
  const mine = field === undefined ? !error.field : error.field === field || error.field?.startsWith(`${field}.`);
  if (!mine) return null;
  return (
    <p id={id} role="alert" className="mt-1 text-sm font-semibold text-clay-600 dark:text-clay-300">
      {error.message}
    </p>
  );
}

export const inputClass =
  'mt-1 w-full rounded-md border border-limestone-400 bg-limestone-50 px-3 py-2 font-sans text-creek dark:border-creek-500 dark:bg-creek-950 dark:text-limestone-100';
export const labelClass = 'block font-sans text-sm font-semibold';

/** A settings form's submit button, with "Saved." beside it once the server has taken the change. */
export function SaveRow({ busy, saved, label }: { busy: boolean; saved: boolean; label: string }) {
  return (
    <div className="flex items-center gap-3">
      <button type="submit" className="cw-button" disabled={busy}>
        {busy ? 'Saving…' : label}
      </button>
      {saved ? (
        <span role="status" className="text-sm text-moss-600 dark:text-moss-300">
          Saved.
        </span>
      ) : null}
    </div>
  );
}
