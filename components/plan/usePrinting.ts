'use client';

import { useSyncExternalStore } from 'react';
import { flushSync } from 'react-dom';

/** Set between beforeprint and afterprint: a browser's print dialog may lay out before print media matches. */
let printing = false;

function subscribe(onChange: () => void) {
  const media = window.matchMedia('print');
  // the print layout is taken right after beforeprint, so the redraw must land before it returns
  const before = () => {
    printing = true;
    flushSync(onChange);
  };
  const after = () => {
    printing = false;
    onChange();
  };
  media.addEventListener('change', onChange);
  window.addEventListener('beforeprint', before);
  window.addEventListener('afterprint', after);
  return () => {
    media.removeEventListener('change', onChange);
    window.removeEventListener('beforeprint', before);
    window.removeEventListener('afterprint', after);
  };
}

/**
 * Whether the page is being printed. The plan's drawings are laid out at the width of the
 * screen; on paper they stand side by side at a width of their own, so they redraw for it.
 */
export function usePrinting(): boolean {
  return useSyncExternalStore(
    subscribe,
    () => printing || window.matchMedia('print').matches,
    () => false,
  );
}
