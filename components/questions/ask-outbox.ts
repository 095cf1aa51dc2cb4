'use client';

import { useEffect, useRef, useState } from 'react';
import { sendJson, type FormError, type Sent } from '@/components/forms/api';
import { discard, enqueue, outboxRecord } from '@/lib/offline/outbox';

type Posted = Sent<{ id: number; url: string }>;

/**
 * Posting a question with no signal: it goes to the phone's outbox under one idempotency
 * key and is sent once when the signal is back. A question the server refused later comes
 * back to this form (`?outbox=<key>`) with the server's reason, to be put right and sent
 * again under the same key.
 */
export function useAskOutbox(putBack: (body: Record<string, unknown>, error?: FormError) => void) {
  const outboxId = useRef<string | null>(null);
  const sendKey = useRef<string | null>(null);
  const [kept, setKept] = useState(false);
  const putBackRef = useRef(putBack);
  useEffect(() => {
    putBackRef.current = putBack;
  });

  useEffect(() => {
    const id = new URLSearchParams(window.location.search).get('outbox');
    if (!id) return;
    void outboxRecord(id).then((r) => {
      if (r?.kind !== 'question') return;
      outboxId.current = r.id;
      putBackRef.current(r.body as Record<string, unknown>, r.error);
    });
  }, []);

  /** Sends the question, or keeps it on the phone; `null` when it was kept. */
  async function post(body: { title: string } & Record<string, unknown>): Promise<Posted | null> {
    const key = outboxId.current ?? (sendKey.current ??= crypto.randomUUID());
    const out = navigator.onLine
      ? await sendJson<{ id: number; url: string }>('/api/questions', 'POST', body, {
          headers: { 'Idempotency-Key': key },
        })
      : null;
    if (out?.ok) {
      if (outboxId.current) await discard(outboxId.current);
      return out;
    }
    if (out && out.status !== 0) return out;
    await enqueue({
      id: key,
      kind: 'question',
      url: '/api/questions',
      body,
      label: `Question: ${body.title}`,
      fixAt: `/questions/ask?outbox=${encodeURIComponent(key)}`,
    });
    sendKey.current = null;
    outboxId.current = null;
    setKept(true);
    return null;
  }

  return { post, kept };
}
