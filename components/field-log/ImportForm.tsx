'use client';

import { useState } from 'react';
import { inputClass, labelClass } from '@/components/forms/api';

interface RowError { line: number; column: string; message: string }
type Outcome = { kind: 'done'; imported: number; skipped: number; errors: RowError[] } | { kind: 'refused'; message: string; errors: RowError[] };

/** Reads a CSV file in the browser and sends its text; shows each row's error by line and column. */
export function ImportForm() {
  const [csv, setCsv] = useState('');
  const [mode, setMode] = useState<'all-or-nothing' | 'valid-only'>('all-or-nothing');
  const [outcome, setOutcome] = useState<Outcome | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(ev: React.FormEvent) {
    ev.preventDefault();
    setBusy(true);
    try {
      const res = await fetch('/api/field-log/import', { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ csv, mode }) });
      const body = (await res.json().catch(() => ({}))) as { imported?: number; skipped?: number; errors?: RowError[]; error?: { message: string } };
      setOutcome(res.ok ? { kind: 'done', imported: body.imported ?? 0, skipped: body.skipped ?? 0, errors: body.errors ?? [] } : { kind: 'refused', message: body.error?.message ?? `Something went wrong (${res.status}).`, errors: body.errors ?? [] });
    } catch {
      setOutcome({ kind: 'refused', message: 'Clackwater could not be reached. Check your connection and try again.', errors: [] });
    }
    setBusy(false);
  }

  return (
    <form onSubmit={submit} className="flex max-w-3xl flex-col gap-4 font-sans" aria-label="Import field log CSV">
      <label className={labelClass}>
        CSV file
        <input type="file" accept=".csv,text/csv" className={inputClass} onChange={async (e) => setCsv((await e.target.files?.[0]?.text()) ?? '')} />
      </label>
      <label className={labelClass}>
        or paste the CSV
        <textarea name="csv" rows={6} className={`${inputClass} font-mono text-xs`} value={csv} onChange={(e) => setCsv(e.target.value)} />
      </label>
      <fieldset className="flex flex-col gap-1 text-sm">
        <legend className={labelClass}>If some rows have errors</legend>
        <label><input type="radio" name="mode" checked={mode === 'all-or-nothing'} onChange={() => setMode('all-or-nothing')} /> import nothing and show me the errors (default)</label>
        <label><input type="radio" name="mode" checked={mode === 'valid-only'} onChange={() => setMode('valid-only')} /> import the valid rows only and list the skipped ones</label>
      </fieldset>
      <button type="submit" className="cw-button self-start" disabled={busy || csv.trim() === ''}>Import</button>
      {outcome ? (
        <div role="status" className="cw-card text-sm">
          {outcome.kind === 'done' ? <p className="font-semibold">Imported {outcome.imported} tests{outcome.skipped ? `; skipped ${outcome.skipped} rows with errors` : ''}.</p> : <p className="font-semibold text-clay-600 dark:text-clay-300">{outcome.message}</p>}
          {outcome.errors.length ? (
            <ul className="mt-2 list-disc pl-5">
              {outcome.errors.map((er) => <li key={`${er.line}-${er.column}`}>Line {er.line}, {er.column}: {er.message}</li>)}
            </ul>
          ) : null}
        </div>
      ) : null}
    </form>
  );
}
