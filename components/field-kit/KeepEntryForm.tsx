'use client';

import { useEffect } from 'react';
import { useFieldMember } from './useFieldMember';

/**
 * Asks the service worker to keep the field log form (/field-log/new) for this member, so
 * it opens at the water with no signal (app/sw.ts, 'keep-entry-form'). Only with a member
 * the server has just confirmed: the worker fetches the page with this member's session.
 */
export function KeepEntryForm() {
  const { actor, offline } = useFieldMember();
  const id = actor?.id;
  useEffect(() => {
    if (!id || offline || !('serviceWorker' in navigator)) return;
    void navigator.serviceWorker.ready.then((reg) => reg.active?.postMessage({ type: 'keep-entry-form' }));
  }, [id, offline]);
  return null;
}
