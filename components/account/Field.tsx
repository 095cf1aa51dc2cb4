import type { InputHTMLAttributes } from 'react';

/** A labelled form input with its rule (hint) and its error beside it. */
export function Field({
  label,
  error,
  hint,
  id,
  ...input
}: InputHTMLAttributes<HTMLInputElement> & { label: string; id: string; error?: string; hint?: string }) {
  const describedBy = [hint ? `${id}-hint` : '', error ? `${id}-error` : ''].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      {hint ? (
        <p id={`${id}-hint`} className="cw-muted text-sm">
          {hint}
        </p>
      ) : null}
      <input
        id={id}
        {...input}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy}
        className={`rounded-md border bg-limestone-50 px-3 py-2 dark:bg-creek-950 ${error ? 'border-signal ring-1 ring-signal' : 'border-limestone-400 dark:border-creek-500'}`}
      />
      {error ? (
        <p id={`${id}-error`} role="alert" className="text-sm font-semibold text-signal-700 dark:text-signal-300">
          {error}
        </p>
      ) : null}
    </div>
  );
}
