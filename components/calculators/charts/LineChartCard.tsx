'use client';

import { XYChart } from '@/components/charts/XYChart';
import { valueText } from '@/components/charts/XYChart';

export interface LinePoint {
  x: number;
  y: number;
}

export interface ChartAxis {
  /** What is measured, e.g. 'lift'. */
  name: string;
  /** The reader's unit for it, e.g. 'ft'. */
  unit: string;
}

/** One curve from the engine, the reader's own case marked and named on it. */
export default function LineChartCard({
  points,
  x,
  y,
  mark,
  title,
}: {
  points: LinePoint[];
  x: ChartAxis;
  y: ChartAxis;
  mark?: LinePoint;
  title: string;
}) {
  const at = (p: LinePoint) => `${valueText(p.y, y.unit)} at ${x.name} ${valueText(p.x, x.unit)}`;
  return (
    <XYChart
      title={title}
      x={{ title: `${x.name} (${x.unit})`, unit: x.unit }}
      y={{ title: `${y.name} (${y.unit})`, unit: y.unit, include: [0] }}
      lines={[{ id: 'curve', label: title, tone: 'curve', points, readouts: true }]}
      mark={mark ? { ...mark, label: `yours: ${at(mark)}` } : undefined}
      table={{
        caption: title,
        columns: [`${x.name} (${x.unit})`, `${y.name} (${y.unit})`],
        rows: [
          ...points.map((p, i) => ({ key: i, cells: [valueText(p.x), valueText(p.y)] })),
          ...(mark ? [{ key: 'yours', cells: [`${valueText(mark.x)} (yours)`, valueText(mark.y)] }] : []),
        ],
      }}
    />
  );
}
