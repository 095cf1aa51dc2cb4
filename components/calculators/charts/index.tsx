'use client';

import dynamic from 'next/dynamic';

/** Charts load after the page, so a guide's first load carries no charting code. */
export const LineChartCard = dynamic(() => import('./LineChartCard'), {
  ssr: false,
  loading: () => (
    <div className="h-full w-full animate-pulse rounded bg-limestone-200 dark:bg-creek-800" aria-hidden="true" />
  ),
});
export const BarChartCard = dynamic(() => import('./BarChartCard'), {
  ssr: false,
  loading: () => (
    <div className="h-full w-full animate-pulse rounded bg-limestone-200 dark:bg-creek-800" aria-hidden="true" />
  ),
});
export type { LinePoint } from './LineChartCard';
export type { BarDatum } from './BarChartCard';
