'use client';

import { useId, useState } from 'react';
import type { MonthlyDelivery } from '@/lib/hydraulics';
import { formatNumber } from '@/lib/calculators/format';
import { monthChartLayout } from '@/lib/plan/monthChart';
import { placeLabel, textWidth, wrapText } from '@/lib/charts/layout';
import { ChartTable, TextLines } from '@/components/charts/parts';
import { TONES } from '@/components/charts/tones';
import { useWidth } from '@/components/charts/useWidth';
import { useUnits } from '@/components/units/UnitsProvider';
import { MonthlyTable } from './MonthlyTable';
import { usePrinting } from './usePrinting';

// the charts' type size and line step (components/charts/XYChart), kept here so the plan
// does not load the curve chart for two numbers
const FONT = 12;
const LINE = 15;

const BAR = TONES.tableA;
const NEED = TONES.curve;

/** Delivery against demand month by month, when the reader gave a wet and a dry flow. */
export function MonthlyChart({ monthly, printWidth }: { monthly: MonthlyDelivery; printWidth: number }) {
  const { units } = useUnits();
  const [ref, measured] = useWidth<HTMLDivElement>();
  const width = usePrinting() ? printWidth : measured;
  const [active, setActive] = useState<number | null>(null);
  const hatch = `hatch-${useId().replace(/[^\w-]/g, '')}`;
  const l = monthChartLayout(monthly, units, width, { font: FONT, line: LINE });
  const { left, top, width: plotW, height: plotH } = l.plot;
  const shown = l.bars.find((b) => b.month === active);
  const title = `Water delivered a day against the need, month by month (${l.unit})`;
  const short = l.shortMonths;

  const readout = (() => {
    if (!shown) return null;
    const lines = wrapText(shown.words, plotW - 8, FONT);
    const w = Math.max(...lines.map((t) => textWidth(t, FONT))) + 8;
    const h = lines.length * LINE + 4;
    const at = placeLabel(shown.x + shown.width / 2 - left, shown.top - top, w, h, plotW, plotH);
    return (
      <g pointerEvents="none" data-chart-label="month">
        <rect
          x={left + at.x}
          y={top + at.y}
          width={w}
          height={h}
          rx={3}
          className={`${TONES.card.fill} ${BAR.stroke}`}
        />
        <TextLines
          lines={lines}
          x={left + at.x + 4}
          y={top + at.y - 2 + LINE}
          step={LINE}
          className={TONES.ink.fill}
          fontWeight={600}
        />
      </g>
    );
  })();

  return (
    <section aria-labelledby="plan-months" className="cw-card flex flex-col gap-2 font-sans" data-testid="plan-months">
      <h2 id="plan-months" className="font-serif text-xl font-semibold">
        Month by month
      </h2>
      <figure className="m-0 flex w-full min-w-0 flex-col gap-2" data-testid="plan-months-chart">
        <div ref={ref} className="w-full min-w-0">
          <svg
            width={width}
            height={l.height}
            viewBox={`0 0 ${width} ${l.height}`}
            role="group"
            aria-label={title}
            className="block h-auto max-w-full select-none font-sans"
            fontSize={FONT}
          >
            <defs>
              <pattern id={hatch} width={6} height={6} patternUnits="userSpaceOnUse" patternTransform="rotate(45)">
                <line x1={0} y1={0} x2={0} y2={6} strokeWidth={2.5} className={BAR.stroke} />
              </pattern>
            </defs>
            <TextLines
              lines={l.yTitle}
              x={2}
              y={LINE - 2}
              step={LINE}
              className={TONES.ink.fill}
              fontWeight={600}
              data-axis-title="y"
            />
            {l.ticks.values.map((v, i) => (
              <g key={v}>
                <line
                  x1={left}
                  x2={left + plotW}
                  y1={l.tickY[i]}
                  y2={l.tickY[i]}
                  className={TONES.grid.stroke}
                  strokeDasharray="3 3"
                />
                <text
                  x={left - 6}
                  y={l.tickY[i]! + 4}
                  textAnchor="end"
                  className={`${TONES.tick.fill} tabular-nums`}
                  data-tick="y"
                >
                  {l.ticks.labels[i]}
                </text>
              </g>
            ))}
            {l.bars.map((b) => (
              <g
                key={b.month}
                tabIndex={0}
                role="img"
                aria-label={b.words}
                className="cursor-pointer outline-none"
                data-month={b.month}
                data-short={b.short ? 'true' : undefined}
                onFocus={() => setActive(b.month)}
                onBlur={() => setActive((a) => (a === b.month ? null : a))}
                onClick={() => setActive(b.month)}
              >
                {/* the whole slot takes a finger, not just the bar */}
                <rect x={b.slotX} y={top} width={b.slotWidth} height={plotH + LINE + 6} fill="transparent" />
                <rect
                  x={b.x}
                  y={b.top}
                  width={b.width}
                  height={Math.max(1, b.height)}
                  fill={b.short ? `url(#${hatch})` : undefined}
                  // a fill class would override the hatch's fill attribute
                  className={b.short ? BAR.stroke : BAR.fill}
                  strokeWidth={b.short ? 1.5 : 0}
                />
                {active === b.month ? (
                  <rect
                    x={b.slotX + 1}
                    y={top - 2}
                    width={b.slotWidth - 2}
                    height={plotH + LINE + 8}
                    rx={3}
                    fill="none"
                    className={TONES.ink.stroke}
                    strokeWidth={2}
                  />
                ) : null}
                <text
                  x={b.slotX + b.slotWidth / 2}
                  y={top + plotH + LINE + 2}
                  textAnchor="middle"
                  className={TONES.tick.fill}
                  fontWeight={b.short ? 700 : 400}
                  data-tick="x"
                >
                  {b.tick}
                </text>
              </g>
            ))}
            {/* the need, a step a month so a need that changes with the season reads too */}
            <path
              d={l.bars
                .map(
                  (b, i) =>
                    `${i ? 'L' : 'M'}${b.slotX.toFixed(1)},${b.needY.toFixed(1)}H${(b.slotX + b.slotWidth).toFixed(1)}`,
                )
                .join('')}
              fill="none"
              strokeWidth={2.5}
              strokeDasharray="7 4"
              className={NEED.stroke}
              aria-hidden="true"
              data-series="need"
            />
            <path d={`M${left},${top}V${top + plotH}H${left + plotW}`} fill="none" className={TONES.axis.stroke} />
            {readout}
          </svg>
        </div>
        <ul className="flex flex-wrap gap-x-5 gap-y-1 text-xs" aria-label="Key">
          <li className="flex items-center gap-2">
            <svg width={14} height={12} aria-hidden="true" className="shrink-0">
              <rect x={1} y={0} width={12} height={12} className={BAR.fill} />
            </svg>
            <span className={TONES.ink.text}>Delivered a day</span>
          </li>
          <li className="flex items-center gap-2">
            <svg width={22} height={12} aria-hidden="true" className="shrink-0">
              <line x1={0} x2={22} y1={6} y2={6} strokeWidth={2.5} strokeDasharray="7 4" className={NEED.stroke} />
            </svg>
            <span className={TONES.ink.text}>Needed a day</span>
          </li>
          <li className="flex items-center gap-2">
            <svg width={14} height={12} aria-hidden="true" className="shrink-0">
              <rect
                x={1}
                y={1}
                width={12}
                height={10}
                fill={`url(#${hatch})`}
                className={BAR.stroke}
                strokeWidth={1.5}
              />
            </svg>
            <span className={TONES.ink.text}>Short of the need (hatched, month in bold)</span>
          </li>
        </ul>
        <figcaption className="text-sm" data-testid="plan-months-summary">
          {short.length === l.bars.length
            ? 'Short of the need in every month.'
            : short.length
              ? `Short of the need in ${listWords(short)}.`
              : 'Enough for the need in every month.'}
          <ChartTable
            data={{
              caption: title,
              columns: ['Month', `Delivered a day (${l.unit})`, `Needed a day (${l.unit})`],
              rows: l.bars.map((b) => ({
                key: b.month,
                cells: [b.name, `${formatNumber(b.delivered)}${b.short ? ' (short)' : ''}`, formatNumber(b.needed)],
              })),
            }}
          />
        </figcaption>
      </figure>
      <details className="text-sm" data-print-hide>
        <summary className="cw-link inline-flex min-h-6 cursor-pointer items-center">The months as a table</summary>
        <div className="mt-2">
          <MonthlyTable monthly={monthly} />
        </div>
      </details>
      <p className="cw-muted text-xs">How the months are estimated: {monthly.method}.</p>
    </section>
  );
}

function listWords(words: string[]) {
  return words.length < 2 ? (words[0] ?? '') : `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`;
}
