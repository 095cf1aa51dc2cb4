'use client';

import { useEffect, useRef, useState } from 'react';

/**
 * The width of a chart's box in px. The server and the first paint lay the chart out for
 * a phone (the narrowest case, so nothing overlaps); the browser then measures and redraws.
 */
export function useWidth<T extends HTMLElement>(initial = 340) {
  const ref = useRef<T>(null);
  const [width, setWidth] = useState(initial);
  useEffect(() => {
    const el = ref.current;
    if (!el) return;
    const measure = () => {
      const w = Math.round(el.getBoundingClientRect().width);
      if (w > 0) setWidth(w);
    };
    measure();
    if (typeof ResizeObserver === 'undefined') return;
    const observer = new ResizeObserver(measure);
    observer.observe(el);
    return () => observer.disconnect();
  }, []);
  return [ref, width] as const;
}
