'use client';

import { useId, useState } from 'react';
import { useRouter } from 'next/navigation';
import type { SiteVisibility } from '@/lib/vocabulary';
import { sendJson } from '@/components/forms/api';
import { VISIBILITY_WORDS } from './words';

/** The owner's controls: the site's name and who may see it. */
export function SiteSettings({ id, name, visibility }: { id: string; name: string; visibility: SiteVisibility }) {
  const uid = useId();
  const router = useRouter();
  const [v, setV] = useState({ name, visibility });
  const [state, setState] = useState<{ busy?: boolean; error?: string; saved?: boolean }>({});
  return (
    <form
      aria-label="Site settings"
      className="cw-card flex flex-wrap items-end gap-3 font-sans text-sm"
      data-print-hide
      onSubmit={async (e) => {
        e.preventDefault();
        setState({ busy: true });
        const r = await sendJson(`/api/sites/${id}`, 'PATCH', v);
        setState(r.ok ? { saved: true } : { error: r.error.message });
        if (r.ok) router.refresh();
      }}
    >
      <label htmlFor={`${uid}-name`} className="flex flex-col">
        <span>Name</span>
        <input
          id={`${uid}-name`}
          value={v.name}
          maxLength={80}
          onChange={(e) => setV({ ...v, name: e.target.value })}
          className="rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1.5 dark:border-creek-500 dark:bg-creek-950"
        />
      </label>
      <label htmlFor={`${uid}-vis`} className="flex flex-col">
        <span>Who can see it</span>
        <select
          id={`${uid}-vis`}
          value={v.visibility}
          onChange={(e) => setV({ ...v, visibility: e.target.value as SiteVisibility })}
          className="rounded-md border border-limestone-400 bg-limestone-50 px-2 py-1.5 dark:border-creek-500 dark:bg-creek-950"
        >
          {(Object.keys(VISIBILITY_WORDS) as SiteVisibility[]).map((k) => (
            <option key={k} value={k}>
              {VISIBILITY_WORDS[k]}
            </option>
          ))}
        </select>
      </label>
      <button
        type="submit"
        disabled={state.busy}
        className="min-h-9 rounded-md border border-creek-400 px-3 py-1.5 font-semibold dark:border-creek-300"
      >
        Save settings
      </button>
      {state.saved ? <span role="status">Saved</span> : null}
      {state.error ? (
        <span role="alert" className="text-signal-700 dark:text-signal-300">
          {state.error}
        </span>
      ) : null}
    </form>
  );
}
