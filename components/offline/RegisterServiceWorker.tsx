'use client';

import { useEffect } from 'react';

/**
 * Registers the field kit's service worker (app/sw.ts, built to /sw.js) once the page has
 * loaded, so it never competes with the page's own scripts. Production builds only: next dev
 * has no worker and would keep a stale one in the way.
 */
export function RegisterServiceWorker() {
  useEffect(() => {
    if (process.env.NODE_ENV !== 'production' || !('serviceWorker' in navigator)) return;
    const register = () => void navigator.serviceWorker.register('/sw.js', { scope: '/' }).catch(() => {});
    if (document.readyState === 'complete') register();
    else window.addEventListener('load', register, { once: true });
  }, []);
  return null;
}
