'use client';

import { useState } from 'react';
import { sendJson } from '@/components/forms/api';

export function RetryButton({ id }: { id: number }) {
  const [state, setState] = useState<'idle' | 'busy' | 'queued' | string>('idle');
  async function retry() {
    setState('busy');
    const out = await sendJson(`/api/admin/outbox/${id}/retry`, 'POST', {});
    setState(out.ok ? 'queued' : out.error.message);
  }
  if (state === 'queued') return <span role="status">queued again</span>;
  return (
    <span className="flex flex-col gap-1">
      <button type="button" className="cw-link text-left" onClick={retry} disabled={state === 'busy'}>
        Send again
      </button>
      {state !== 'idle' && state !== 'busy' ? <span role="alert">{state}</span> : null}
    </span>
  );
}
