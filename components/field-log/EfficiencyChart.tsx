'use client';

import { useRouter } from 'next/navigation';
import {
  Area,
  CartesianGrid,
  ComposedChart,
  Legend,
  Line,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { EFFICIENCY_BANDS, EFFICIENCY_SOURCES } from '@/lib/hydraulics/efficiency';
import { palette } from '@/tailwind.config';

export interface ChartPoint {
  id: number;
  x: number;
  y: number;
  site: string;
  mine: boolean;
}

const band = EFFICIENCY_BANDS.homemade.rows
  .filter((r) => r.ratio <= 30)
  .map((r) => ({
    x: r.ratio,
    range: [r.low, r.high] as [number, number],
    typical: r.typical,
    commercial: undefined as number | undefined,
  }));
for (const r of EFFICIENCY_BANDS.commercial.rows) {
  const hit = band.find((b) => b.x === r.ratio);
  if (hit) hit.commercial = r.typical;
}

/** The published tables drawn as they are printed, beside the band derived from them. */
const PUBLISHED = EFFICIENCY_SOURCES.filter(
  (src) => src.id === 'pocketbook-table' || src.id === 'water-for-the-world-homemade',
).map((src) => ({ ...src, data: src.points.map(([x, y]) => ({ x, published: y })) }));
const PUBLISHED_STYLE: Record<string, { stroke: string; dash?: string; name: string }> = {
  'pocketbook-table': { stroke: palette.creek[700], name: 'published table (Pocketbook)' },
  'water-for-the-world-homemade': {
    stroke: palette.clay[700],
    dash: '8 3',
    name: 'published home-built figure (Water for the World)',
  },
};

/** Efficiency (D'Aubuisson) against lift ratio for every entry, the reader's own marked, over the engine's typical band. */
export function EfficiencyChart({ points }: { points: ChartPoint[] }) {
  const router = useRouter();
  const others = points.filter((p) => !p.mine);
  const mine = points.filter((p) => p.mine);
  const dot = (fill: string, size: number) =>
    function Dot(props: unknown) {
      const { cx, cy, payload } = props as { cx: number; cy: number; payload?: Partial<ChartPoint> };
      // recharts also draws the shape for legend and tooltip markers, without a point behind it
      if (!payload || typeof payload.y !== 'number' || typeof payload.x !== 'number' || payload.id === undefined)
        return <circle cx={cx} cy={cy} r={size} fill={fill} />;
      return (
        <a
          href={`/field-log/${payload.id}`}
          aria-label={`${payload.site}: efficiency ${payload.y.toFixed(2)} at lift ratio ${payload.x.toFixed(1)}`}
          data-entry-id={payload.id}
        >
          <circle
            cx={cx}
            cy={cy}
            r={size}
            fill={fill}
            stroke={palette.limestone[50]}
            strokeWidth={1}
            style={{ cursor: 'pointer' }}
          />
        </a>
      );
    };
  return (
    <figure
      className="h-80 w-full sm:h-96"
      aria-label="Field log: efficiency against lift ratio"
      data-testid="field-log-chart"
    >
      <ResponsiveContainer width="100%" height="100%">
        <ComposedChart margin={{ top: 8, right: 12, bottom: 24, left: 8 }} data={band}>
          <CartesianGrid stroke={palette.limestone[300]} strokeDasharray="3 3" />
          <XAxis
            dataKey="x"
            type="number"
            domain={[0, 'auto']}
            label={{ value: 'lift ÷ fall (h/H)', position: 'insideBottom', offset: -12, fontSize: 12 }}
            tick={{ fontSize: 11 }}
          />
          <YAxis
            type="number"
            domain={[0, 1]}
            label={{ value: "efficiency (D'Aubuisson)", angle: -90, position: 'insideLeft', fontSize: 12 }}
            tick={{ fontSize: 11 }}
            width={56}
          />
          <Tooltip
            formatter={(v) => (Array.isArray(v) ? v.map((n) => Number(n).toFixed(2)).join('–') : Number(v).toFixed(2))}
            labelFormatter={(l) => `h/H ${Number(l).toFixed(1)}`}
          />
          <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
          <Area
            dataKey="range"
            name="homemade typical band"
            stroke="none"
            fill={palette.moss[300]}
            fillOpacity={0.35}
            isAnimationActive={false}
          />
          <Line
            dataKey="typical"
            name="homemade typical"
            stroke={palette.moss[600]}
            strokeDasharray="5 4"
            dot={false}
            isAnimationActive={false}
          />
          <Line
            dataKey="commercial"
            name="commercial typical"
            stroke={palette.creek[400]}
            strokeDasharray="2 3"
            dot={false}
            connectNulls
            isAnimationActive={false}
          />
          {PUBLISHED.map((src) => {
            const style = PUBLISHED_STYLE[src.id];
            return (
              <Line
                key={src.id}
                data={src.data}
                dataKey="published"
                name={style?.name ?? src.label}
                stroke={style?.stroke}
                strokeDasharray={style?.dash}
                dot={{ r: 2 }}
                isAnimationActive={false}
              />
            );
          })}
          {/* an empty series would fall back to the chart's band rows and draw phantom points */}
          {others.length ? (
            <Scatter
              data={others}
              dataKey="y"
              name="entries"
              legendType="circle"
              fill={palette.clay.DEFAULT}
              shape={dot(palette.clay.DEFAULT, 5)}
              isAnimationActive={false}
              onClick={(p) => router.push(`/field-log/${(p as unknown as { payload: ChartPoint }).payload.id}`)}
            />
          ) : null}
          {mine.length ? (
            <Scatter
              data={mine}
              dataKey="y"
              name="your entries"
              legendType="circle"
              fill={palette.creek.DEFAULT}
              shape={dot(palette.creek.DEFAULT, 7)}
              isAnimationActive={false}
            />
          ) : null}
        </ComposedChart>
      </ResponsiveContainer>
      <figcaption className="cw-muted mt-1 flex flex-col gap-1 font-sans text-xs">
        <span data-testid="field-log-count">
          {points.length === 1 ? '1 field log measurement' : `${points.length} field log measurements`} beside the
          published tables and the engine&apos;s band built from them. Each point opens its entry.
        </span>
        <details>
          <summary className="cw-link cursor-pointer">Sources</summary>
          <ul className="mt-1 flex list-disc flex-col gap-1 pl-4">
            <li>
              Band, {EFFICIENCY_BANDS.homemade.label}: {EFFICIENCY_BANDS.homemade.source}.
            </li>
            {PUBLISHED.map((src) => (
              <li key={src.id}>
                {PUBLISHED_STYLE[src.id]?.name ?? src.label}: {src.citation}
                {src.note ? ` (${src.note})` : ''}.
              </li>
            ))}
          </ul>
        </details>
      </figcaption>
    </figure>
  );
}
