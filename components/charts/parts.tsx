import type { SVGProps } from 'react';
import { TONES, type ToneName } from './tones';

export interface LegendItem {
  label: string;
  tone: ToneName;
  shape: 'line' | 'dot' | 'large-dot' | 'band' | 'line-markers';
  dash?: string;
}

/** The key to a chart's series, in HTML so it wraps at the width of a phone. */
export function Legend({ items }: { items: LegendItem[] }) {
  return (
    <ul className="grid grid-cols-2 gap-x-3 gap-y-1 font-sans text-xs sm:flex sm:flex-wrap sm:gap-x-5" aria-label="Key">
      {items.map((item) => (
        <li key={item.label} className="flex items-center gap-2">
          <svg width={22} height={12} aria-hidden="true" className="shrink-0">
            {item.shape === 'band' ? (
              <rect x={1} y={1} width={20} height={10} className={`${TONES.bandFill.fill} ${TONES.bandEdge.stroke}`} />
            ) : item.shape === 'dot' || item.shape === 'large-dot' ? (
              <circle cx={11} cy={6} r={item.shape === 'dot' ? 4 : 5.5} className={TONES[item.tone].fill} />
            ) : (
              <>
                <line
                  x1={0}
                  x2={22}
                  y1={6}
                  y2={6}
                  strokeWidth={2.5}
                  strokeDasharray={item.dash}
                  className={TONES[item.tone].stroke}
                />
                {item.shape === 'line-markers' ? (
                  <rect x={8} y={3} width={6} height={6} className={TONES[item.tone].fill} />
                ) : null}
              </>
            )}
          </svg>
          <span className={TONES.ink.text}>{item.label}</span>
        </li>
      ))}
    </ul>
  );
}

export interface ChartTableData {
  caption: string;
  columns: string[];
  rows: { key: string | number; cells: string[] }[];
}

/** The chart's numbers as a table for screen readers; sighted readers have the chart. */
export function ChartTable({ data }: { data: ChartTableData }) {
  return (
    // the wrapper clips: a table ignores the 1 px width and overflow of .sr-only and would widen the page
    <div className="sr-only">
      <table>
        <caption>{data.caption}</caption>
        <thead>
          <tr>
            {data.columns.map((c) => (
              <th key={c} scope="col">
                {c}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {data.rows.map((r) => (
            <tr key={r.key}>
              {r.cells.map((c, i) =>
                i === 0 ? (
                  <th key={i} scope="row">
                    {c}
                  </th>
                ) : (
                  <td key={i}>{c}</td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

/**
 * Wrapped text drawn one <text> per line, the first baseline at `y`, each next one `step` lower.
 * Every line but the last keeps its trailing space, so the words do not run together when the
 * chart's text is read (screen readers, textContent).
 */
export function TextLines({
  lines,
  x,
  y,
  step,
  ...attrs
}: { lines: string[]; x: number; y: number; step: number } & Omit<SVGProps<SVGTextElement>, 'x' | 'y'>) {
  return (
    <>
      {lines.map((l, i) => (
        <text key={i} x={x} y={y + i * step} {...attrs}>
          {i < lines.length - 1 ? `${l} ` : l}
        </text>
      ))}
    </>
  );
}
