'use client';

import { useState } from 'react';
import { inputClass, labelClass, sendJson } from '@/components/forms/api';

interface RowError {
  line: number;
  column: string;
  message: string;
}
type Outcome =
  | { kind: 'done'; imported: number; skipped: number; errors: RowError[] }
  | { kind: 'refused'; message: string; errors: RowError[] };

/** Reads a CSV file in the browser and sends its text; shows each row's error by line and column. */
export function ImportForm() {
  const [csv, setCsv] = useState('');
  const [mode, setMode] = useState<'all-or-nothing' | 'valid-only'>('all-or-nothing');
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(ev: React.FormEvent) {
    ev.preventDefault();
    setBusy(true);
    const r = await sendJson<{ imported?: number; skipped?: number; errors?: RowError[] }>(
      '/api/field-log/import',
      'POST',
      { csv, mode },
    );
    if (r.ok)
      setOutcome({
        kind: 'done',
        imported: r.data?.imported ?? 0,
        skipped: r.data?.skipped ?? 0,
        errors: r.data?.errors ?? [],
      });
    else
      setOutcome({
        kind: 'refused',
        message: r.error.message,
        errors: (r.body as { errors?: RowError[] } | null)?.errors ?? [],
      });
    setBusy(false);
  }

  return (
    <form onSubmit={submit} className="flex max-w-3xl flex-col gap-4 font-sans" aria-label="Import field log CSV">
      <label className={labelClass}>
        CSV file
        <input
          type="file"
          accept=".csv,text/csv"
          className={inputClass}
          onChange={async (e) => setCsv((await e.target.files?.[0]?.text()) ?? '')}
        />
      </label>
      <label className={labelClass}>
        or paste the CSV
        <textarea
          name="csv"
          rows={6}
          className={`${inputClass} font-mono text-xs`}
          value={csv}
          onChange={(e) => setCsv(e.target.value)}
        />
      </label>
      <fieldset className="flex flex-col gap-1 text-sm">
        <legend className={labelClass}>If some rows have errors</legend>
        <label>
          <input
            type="radio"
            name="mode"
            checked={mode === 'all-or-nothing'}
            onChange={() => setMode('all-or-nothing')}
          />{' '}
          import nothing and show me the errors (default)
        </label>
        <label>
          <input type="radio" name="mode" checked={mode === 'valid-only'} onChange={() => setMode('valid-only')} />{' '}
          import the valid rows only and list the skipped ones
        </label>
      </fieldset>
      <button type="submit" className="cw-button self-start" disabled={busy || csv.trim() === ''}>
        Import
      </button>
      {outcome ? (
        <div role="status" className="cw-card text-sm">
          {outcome.kind === 'done' ? (
            <p className="font-semibold">
              Imported {outcome.imported} tests{outcome.skipped ? `; skipped ${outcome.skipped} rows with errors` : ''}.
            </p>
          ) : (
            <p className="font-semibold text-clay-600 dark:text-clay-300">{outcome.message}</p>
          )}
          {outcome.errors.length ? (
            <ul className="mt-2 list-disc pl-5">
              {outcome.errors.map((er) => (
                <li key={`${er.line}-${er.column}`}>
                  Line {er.line}, {er.column}: {er.message}
                </li>
              ))}
            </ul>
          ) : null}
        </div>
      ) : null}
    </form>
  );
}
