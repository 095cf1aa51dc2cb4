'use client';

import { Bar, BarChart, CartesianGrid, ResponsiveContainer, Tooltip, XAxis, YAxis, Cell } from 'recharts';
import { palette } from '@/tailwind.config';

export interface BarDatum {
  name: string;
  value: number;
  highlight?: boolean;
}

/** A small bar chart, the reader's own case in slate and the others in clay. */
export default function BarChartCard({
  bars,
  yLabel,
  ariaLabel,
}: {
  bars: BarDatum[];
  yLabel: string;
  ariaLabel: string;
}) {
  const fmt = (v: number) => (Math.abs(v) >= 100 ? v.toFixed(0) : v.toPrecision(2));
  return (
    <figure className="h-full w-full" aria-label={ariaLabel} role="img">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={bars} margin={{ top: 8, right: 8, bottom: 8, left: 8 }}>
          <CartesianGrid stroke={palette.limestone[300]} strokeDasharray="3 3" vertical={false} />
          <XAxis dataKey="name" tick={{ fontSize: 10 }} interval={0} />
          <YAxis
            tickFormatter={fmt}
            tick={{ fontSize: 11 }}
            width={56}
            label={{ value: yLabel, angle: -90, position: 'insideLeft', fontSize: 12 }}
          />
          <Tooltip formatter={(v) => fmt(Number(v))} />
          <Bar dataKey="value" isAnimationActive={false}>
            {bars.map((b) => (
              <Cell key={b.name} fill={b.highlight ? palette.creek.DEFAULT : palette.clay[400]} />
            ))}
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </figure>
  );
}
