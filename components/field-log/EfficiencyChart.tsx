'use client';

import { XYChart, type XYDot, type XYLine } from '@/components/charts/XYChart';
import type { LegendItem } from '@/components/charts/parts';
import { EFFICIENCY_BANDS, EFFICIENCY_SOURCES } from '@/lib/hydraulics/efficiency';

export interface ChartPoint {
  id: number;
  x: number;
  y: number;
  site: string;
  mine: boolean;
}

const band = EFFICIENCY_BANDS.homemade.rows
  .filter((r) => r.ratio <= 30)
  .map((r) => ({ x: r.ratio, low: r.low, high: r.high, typical: r.typical }));
const commercial = EFFICIENCY_BANDS.commercial.rows
  .filter((r) => r.ratio <= 30)
  .map((r) => ({ x: r.ratio, y: r.typical }));

/** The published tables drawn as they are printed, beside the band derived from them. */
const PUBLISHED: (XYLine & { citation: string; note?: string })[] = EFFICIENCY_SOURCES.filter(
  (src) => src.id === 'pocketbook-table' || src.id === 'water-for-the-world-homemade',
).map((src) => ({
  id: src.id,
  label: src.id === 'pocketbook-table' ? 'Pocketbook table' : 'Water for the World',
  tone: src.id === 'pocketbook-table' ? 'tableA' : 'tableB',
  dash: src.id === 'pocketbook-table' ? undefined : '8 3',
  markers: true,
  points: src.points.map(([x, y]) => ({ x, y })),
  citation: src.citation,
  note: src.note,
}));

const LINES: XYLine[] = [
  {
    id: 'typical',
    label: 'home-built typical',
    tone: 'typical',
    dash: '5 4',
    points: band.map((b) => ({ x: b.x, y: b.typical })),
  },
  ...PUBLISHED,
  // drawn last: where it follows the Pocketbook table its dots still show on top
  { id: 'commercial', label: 'commercial typical', tone: 'commercial', dash: '2 3', points: commercial },
];

const two = (v: number) => v.toFixed(2);
const one = (v: number) => v.toFixed(1);

/** Efficiency (D'Aubuisson) against lift ratio for every entry, the reader's own marked, over the engine's typical band. */
export function EfficiencyChart({ points }: { points: ChartPoint[] }) {
  const newestMine = points
    .filter((p) => p.mine)
    .reduce<ChartPoint | null>((a, p) => (!a || p.id > a.id ? p : a), null);
  // the reader's own entries are drawn last, so no one else's point covers them
  const dots: XYDot[] = [...points]
    .sort((a, b) => Number(a.mine) - Number(b.mine))
    .map((p) => ({
      key: p.id,
      x: p.x,
      y: p.y,
      href: `/field-log/${p.id}`,
      entryId: p.id,
      tone: p.mine ? 'mine' : 'others',
      large: p.mine,
      pinned: p.id === newestMine?.id,
      label: `${p.mine ? 'yours, ' : ''}${p.site}: ${two(p.y)} at h/H ${one(p.x)}`,
      name: `${p.site}${p.mine ? ' (yours)' : ''}: efficiency ${two(p.y)} at lift ratio ${one(p.x)}`,
    }));
  const legend: LegendItem[] = [
    { label: 'home-built band', tone: 'bandEdge', shape: 'band' },
    { label: 'home-built typical', tone: 'typical', shape: 'line', dash: '5 4' },
    { label: 'commercial typical', tone: 'commercial', shape: 'line', dash: '2 3' },
    ...PUBLISHED.map((p) => ({ label: p.label, tone: p.tone, shape: 'line-markers' as const, dash: p.dash })),
    { label: 'field log entries', tone: 'others', shape: 'dot' },
    ...(newestMine ? [{ label: 'your entries', tone: 'mine' as const, shape: 'large-dot' as const }] : []),
  ];
  return (
    <XYChart
      testId="field-log-chart"
      title="Field log: efficiency against lift ratio"
      height={320}
      x={{ title: 'lift ÷ fall (h/H)', include: [0] }}
      y={{ title: "efficiency (D'Aubuisson)", include: [0, 1] }}
      band={{ label: 'home-built band', points: band }}
      lines={LINES}
      dots={dots}
      legend={legend}
      table={{
        caption: 'Measurements on the chart: site, lift ratio and efficiency',
        columns: ['Site', 'Lift ratio h/H', "Efficiency (D'Aubuisson)"],
        rows: points.map((p) => ({ key: p.id, cells: [p.mine ? `${p.site} (yours)` : p.site, one(p.x), two(p.y)] })),
      }}
      caption={
        <span className="flex flex-col gap-1">
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
                  {src.label}: {src.citation}
                  {src.note ? ` (${src.note})` : ''}.
                </li>
              ))}
            </ul>
          </details>
        </span>
      }
    />
  );
}
