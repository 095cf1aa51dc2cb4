'use client';

import { CartesianGrid, Line, LineChart, ReferenceDot, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { palette } from '@/tailwind.config';

export interface LinePoint {
  x: number;
  y: number;
}

/** A small line chart of one curve, with an optional marked point (the reader's own case). */
export default function LineChartCard({
  points,
  xLabel,
  yLabel,
  mark,
  ariaLabel,
}: {
  points: LinePoint[];
  xLabel: string;
  yLabel: string;
  mark?: LinePoint;
  ariaLabel: string;
}) {
  const fmt = (v: number) => (Math.abs(v) >= 100 ? v.toFixed(0) : Math.abs(v) >= 10 ? v.toFixed(1) : v.toPrecision(2));
  return (
    <figure className="h-full w-full" aria-label={ariaLabel} role="img">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={points} margin={{ top: 8, right: 12, bottom: 24, left: 8 }}>
          <CartesianGrid stroke={palette.limestone[300]} strokeDasharray="3 3" />
          <XAxis
            dataKey="x"
            type="number"
            domain={['dataMin', 'dataMax']}
            tickFormatter={fmt}
            label={{ value: xLabel, position: 'insideBottom', offset: -12, fontSize: 12 }}
            tick={{ fontSize: 11 }}
          />
          <YAxis
            tickFormatter={fmt}
            label={{ value: yLabel, angle: -90, position: 'insideLeft', fontSize: 12 }}
            tick={{ fontSize: 11 }}
            width={56}
          />
          <Tooltip formatter={(v) => fmt(Number(v))} labelFormatter={(l) => `${xLabel}: ${fmt(Number(l))}`} />
          <Line
            type="monotone"
            dataKey="y"
            stroke={palette.clay.DEFAULT}
            strokeWidth={2}
            dot={false}
            isAnimationActive={false}
          />
          {mark ? (
            <ReferenceDot x={mark.x} y={mark.y} r={5} fill={palette.creek.DEFAULT} stroke={palette.limestone[50]} />
          ) : null}
        </LineChart>
      </ResponsiveContainer>
    </figure>
  );
}
