'use client';

import { useState } from 'react';
import { horizontalTicks, textWidth, wrapText } from '@/lib/charts/layout';
import { spanOf } from '@/lib/charts/ticks';
import { ChartTable, TextLines } from './parts';
import { TONES } from './tones';
import { useWidth } from './useWidth';
import { FONT, LINE, valueText } from './XYChart';

export interface BarRow {
  name: string;
  value: number;
  /** The reader's own case, drawn in slate and named "yours". */
  highlight?: boolean;
}

const BAR = 14;

/** Each row's name lines and heights, stacked from the top. */
function layoutRows(bars: BarRow[], unit: string | undefined, plotW: number) {
  let y = 4;
  const rows = bars.map((b) => {
    const valueLabel = valueText(b.value, unit);
    const name = b.highlight ? `${b.name} (yours)` : b.name;
    const nameLines = wrapText(name, plotW - textWidth(valueLabel, FONT) - 12, FONT);
    const row = { ...b, valueLabel, nameLines, top: y, barY: y + nameLines.length * LINE + 3 };
    y = row.barY + BAR + 10;
    return row;
  });
  return { rows, plotBottom: y };
}

/**
 * Bars lying down, one per row, each name and value written above its bar: the names
 * never crowd each other at a phone's width, however many rows there are.
 */
export function BarRows({
  title,
  bars,
  axis,
}: {
  title: string;
  bars: BarRow[];
  axis: { title: string; unit?: string };
}) {
  const [ref, width] = useWidth<HTMLDivElement>();
  const [focused, setFocused] = useState<string | null>(null);
  const [lo, hi] = spanOf(
    bars.map((b) => b.value),
    [],
    true,
  );
  const left = 2;
  // the last tick's label is centred on the axis end, so half of it hangs past the bars
  const first = horizontalTicks(lo, hi, width - left - 14, FONT);
  const right = Math.max(14, Math.ceil(textWidth(first.labels.at(-1) ?? '', FONT) / 2) + 2);
  const plotW = Math.max(40, width - left - right);
  const ticks = horizontalTicks(lo, hi, plotW, FONT);
  const sx = (v: number) => left + ((v - ticks.min) / (ticks.max - ticks.min || 1)) * plotW;

  const { rows, plotBottom } = layoutRows(bars, axis.unit, plotW);
  const titleLines = wrapText(axis.title, width - 4, FONT);
  const height = plotBottom + LINE + 6 + titleLines.length * LINE + 4;

  return (
    <figure className="flex w-full min-w-0 flex-col gap-2">
      <div ref={ref} className="w-full min-w-0">
        <svg
          width={width}
          height={height}
          viewBox={`0 0 ${width} ${height}`}
          role="group"
          aria-label={title}
          className="block max-w-full select-none font-sans"
          fontSize={FONT}
        >
          {ticks.values.map((v, i) => (
            <g key={v}>
              <line x1={sx(v)} x2={sx(v)} y1={0} y2={plotBottom} className={TONES.grid.stroke} strokeDasharray="3 3" />
              <text
                x={sx(v)}
                y={plotBottom + LINE + 2}
                textAnchor={i === 0 ? 'start' : 'middle'}
                className={TONES.tick.fill}
                data-tick="x"
              >
                {ticks.labels[i]}
              </text>
            </g>
          ))}
          <line x1={sx(0)} x2={sx(0)} y1={0} y2={plotBottom} className={TONES.axis.stroke} />
          {rows.map((r) => {
            const tone = r.highlight ? TONES.mine : TONES.others;
            return (
              <g
                key={r.name}
                tabIndex={0}
                role="img"
                aria-label={`${r.nameLines.join(' ')}: ${r.valueLabel}`}
                className="outline-none"
                data-bar={r.name}
                onFocus={() => setFocused(r.name)}
                onBlur={() => setFocused((f) => (f === r.name ? null : f))}
              >
                <rect
                  x={0}
                  y={r.top - 2}
                  width={width}
                  height={r.barY + BAR - r.top + 6}
                  rx={4}
                  fill="transparent"
                  className={TONES.ink.stroke}
                  strokeWidth={focused === r.name ? 2 : 0}
                />
                <TextLines
                  lines={r.nameLines}
                  x={left}
                  y={r.top + LINE - 3}
                  step={LINE}
                  className={TONES.ink.fill}
                  fontWeight={r.highlight ? 700 : 400}
                />
                <text
                  x={left + plotW}
                  y={r.top + LINE - 3}
                  textAnchor="end"
                  className={`${TONES.ink.fill} tabular-nums`}
                  fontWeight={600}
                >
                  {r.valueLabel}
                </text>
                <rect
                  x={sx(0)}
                  y={r.barY}
                  width={Math.max(1, sx(r.value) - sx(0))}
                  height={BAR}
                  rx={2}
                  className={tone.fill}
                />
              </g>
            );
          })}
          <TextLines
            lines={titleLines}
            x={left + plotW / 2}
            y={plotBottom + 2 * LINE + 4}
            step={LINE}
            textAnchor="middle"
            className={TONES.ink.fill}
            fontWeight={600}
            data-axis-title="x"
          />
        </svg>
      </div>
      <figcaption className="sr-only">
        <ChartTable
          data={{
            caption: title,
            columns: ['', axis.title],
            rows: rows.map((r) => ({ key: r.name, cells: [r.highlight ? `${r.name} (yours)` : r.name, r.valueLabel] })),
          }}
        />
      </figcaption>
    </figure>
  );
}
