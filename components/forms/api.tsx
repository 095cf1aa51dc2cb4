import type { FormError } from '@/lib/http/client';

/* What the forms share: the one JSON client (lib/http/client.ts) and the error shown beside its field. */
export { getJson, getJsonOrNull, sendJson, type FormError, type Sent } from '@/lib/http/client';

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
