'use client';

import { BarRows, type BarRow } from '@/components/charts/BarRows';

export type BarDatum = BarRow;

/** Bars for a handful of cases, the reader's own in slate and named "yours". */
export default function BarChartCard({
  bars,
  axis,
  title,
}: {
  bars: BarDatum[];
  axis: { name: string; unit: string };
  title: string;
}) {
  return <BarRows title={title} bars={bars} axis={{ title: `${axis.name} (${axis.unit})`, unit: axis.unit }} />;
}
