'use client';

import { useState, type ReactNode } from 'react';
import { formatNumber } from '@/lib/calculators/format';
import { horizontalTicks, placeLabel, textWidth, verticalTicks, wrapText } from '@/lib/charts/layout';
import { spanOf } from '@/lib/charts/ticks';
import { ChartTable, Legend, TextLines, type ChartTableData, type LegendItem } from './parts';
import { TONES, type ToneName } from './tones';
import { useWidth } from './useWidth';

export interface XYAxis {
  /** Words and unit, e.g. 'lift (ft)'; always drawn whole, wrapped if the chart is narrow. */
  title: string;
  /** The unit a value is read in, for labels and names ('ft'); empty for a ratio. */
  unit?: string;
  /** Values the axis must reach, such as 0 or the top of a band. */
  include?: number[];
}

export interface XYLine {
  id: string;
  label: string;
  tone: ToneName;
  dash?: string;
  points: { x: number; y: number }[];
  /** Small square markers at the points, for series printed as tables. */
  markers?: boolean;
  /** Points a finger or the keyboard can stop at to read the curve (up to seven, spread along it). */
  readouts?: boolean;
}

export interface XYDot {
  key: string | number;
  x: number;
  y: number;
  /** Short words shown beside the point while it has focus or a finger. */
  label: string;
  /** Its accessible name, values included. */
  name: string;
  href?: string;
  tone: ToneName;
  large?: boolean;
  entryId?: number;
  /** Label kept beside it while nothing else is pointed at (the reader's own entry). */
  pinned?: boolean;
}

export interface XYMark {
  x: number;
  y: number;
  /** Always shown beside the point, e.g. 'yours: 30 US gal/h'. */
  label: string;
}

/** The charts' type size and line step, in px (BarRows draws with the same). */
export const FONT = 12;
export const LINE = 15;
const HIT = 12; // radius of the invisible target: 24 px across (WCAG 2.2, 2.5.8)

export function valueText(v: number, unit?: string) {
  return unit ? `${formatNumber(v)} ${unit}` : formatNumber(v);
}

/** A chart of curves, a band and points on two number axes, drawn as SVG at the box's own width. */
export function XYChart({
  title,
  x,
  y,
  lines = [],
  band,
  dots = [],
  mark,
  height = 240,
  legend,
  table,
  caption,
  testId,
}: {
  title: string;
  x: XYAxis;
  y: XYAxis;
  lines?: XYLine[];
  band?: { label: string; points: { x: number; low: number; high: number }[] };
  dots?: XYDot[];
  mark?: XYMark;
  height?: number;
  legend?: LegendItem[];
  table?: ChartTableData;
  caption?: ReactNode;
  testId?: string;
}) {
  const [ref, width] = useWidth<HTMLDivElement>();
  const [active, setActive] = useState<string | null>(null);

  const xs = [
    ...lines.flatMap((l) => l.points.map((p) => p.x)),
    ...(band?.points.map((p) => p.x) ?? []),
    ...dots.map((d) => d.x),
  ];
  const ys = [
    ...lines.flatMap((l) => l.points.map((p) => p.y)),
    ...(band?.points.flatMap((p) => [p.low, p.high]) ?? []),
    ...dots.map((d) => d.y),
  ];
  // the reader's own point widens the axes rather than falling off them
  const [x0, x1] = spanOf(xs, [...(x.include ?? []), ...(mark ? [mark.x] : [])]);
  const [y0, y1] = spanOf(ys, [...(y.include ?? []), ...(mark ? [mark.y] : [])]);

  const yTitle = wrapText(y.title, width - 4, FONT);
  const xTitle = wrapText(x.title, width - 4, FONT);
  const top = yTitle.length * LINE + 10;
  const bottom = 6 + LINE + xTitle.length * LINE + 4;
  const plotH = Math.max(60, height - top - bottom);
  const yt = verticalTicks(y0, y1, plotH, FONT);
  const left = Math.ceil(yt.labelWidth) + 10;
  let right = 12;
  let xt = horizontalTicks(x0, x1, width - left - right, FONT);
  right = Math.max(12, Math.ceil(textWidth(xt.labels.at(-1) ?? '', FONT) / 2) + 2);
  xt = horizontalTicks(x0, x1, width - left - right, FONT);
  const plotW = Math.max(40, width - left - right);
  const sx = (v: number) => left + ((v - xt.min) / (xt.max - xt.min || 1)) * plotW;
  const sy = (v: number) => top + plotH - ((v - yt.min) / (yt.max - yt.min || 1)) * plotH;
  const path = (pts: { x: number; y: number }[]) =>
    pts.map((p, i) => `${i ? 'L' : 'M'}${sx(p.x).toFixed(1)},${sy(p.y).toFixed(1)}`).join('');

  const readouts: XYDot[] = lines
    .filter((l) => l.readouts && l.points.length)
    .flatMap((l) => {
      const n = Math.min(7, l.points.length);
      const picks = [
        ...new Set(Array.from({ length: n }, (_, i) => Math.round((i * (l.points.length - 1)) / (n - 1 || 1)))),
      ];
      return picks.map((i) => {
        const p = l.points[i]!;
        const words = `${valueText(p.y, y.unit)} at ${valueText(p.x, x.unit)}`;
        return { key: `${l.id}-${i}`, x: p.x, y: p.y, label: words, name: `${l.label}: ${words}`, tone: l.tone };
      });
    });
  const targets = [...readouts, ...dots];
  const shown = targets.find((t) => String(t.key) === active);

  const labelBox = (text: string, px: number, py: number, tone: ToneName, key: string) => {
    const lines = wrapText(text, plotW - 8, FONT);
    const w = Math.max(...lines.map((l) => textWidth(l, FONT))) + 8;
    const h = lines.length * LINE + 4;
    const at = placeLabel(px - left, py - top, w, h, plotW, plotH);
    return (
      <g key={key} pointerEvents="none" data-chart-label={key}>
        <rect
          x={left + at.x}
          y={top + at.y}
          width={w}
          height={h}
          rx={3}
          className={`${TONES.card.fill} ${TONES[tone].stroke}`}
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
  };

  return (
    <figure className="flex w-full min-w-0 flex-col gap-2" data-testid={testId}>
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
          <TextLines
            lines={yTitle}
            x={2}
            y={LINE - 2}
            step={LINE}
            className={TONES.ink.fill}
            fontWeight={600}
            data-axis-title="y"
          />
          {yt.values.map((v, i) => (
            <g key={`y${v}`}>
              <line
                x1={left}
                x2={left + plotW}
                y1={sy(v)}
                y2={sy(v)}
                className={TONES.grid.stroke}
                strokeDasharray="3 3"
              />
              <text x={left - 6} y={sy(v) + 4} textAnchor="end" className={TONES.tick.fill} data-tick="y">
                {yt.labels[i]}
              </text>
            </g>
          ))}
          {xt.values.map((v, i) => (
            <g key={`x${v}`}>
              <line
                x1={sx(v)}
                x2={sx(v)}
                y1={top}
                y2={top + plotH}
                className={TONES.grid.stroke}
                strokeDasharray="3 3"
              />
              <text x={sx(v)} y={top + plotH + LINE + 2} textAnchor="middle" className={TONES.tick.fill} data-tick="x">
                {xt.labels[i]}
              </text>
            </g>
          ))}
          <path d={`M${left},${top}V${top + plotH}H${left + plotW}`} fill="none" className={TONES.axis.stroke} />
          <TextLines
            lines={xTitle}
            x={left + plotW / 2}
            y={top + plotH + 4 + 2 * LINE}
            step={LINE}
            textAnchor="middle"
            className={TONES.ink.fill}
            fontWeight={600}
            data-axis-title="x"
          />
          {band && band.points.length > 1 ? (
            <g aria-hidden="true">
              <path
                d={`${path(band.points.map((p) => ({ x: p.x, y: p.high })))}L${[...band.points]
                  .reverse()
                  .map((p) => `${sx(p.x).toFixed(1)},${sy(p.low).toFixed(1)}`)
                  .join('L')}Z`}
                className={`${TONES.bandFill.fill} stroke-none`}
              />
              <path
                d={path(band.points.map((p) => ({ x: p.x, y: p.high })))}
                fill="none"
                className={TONES.bandEdge.stroke}
              />
              <path
                d={path(band.points.map((p) => ({ x: p.x, y: p.low })))}
                fill="none"
                className={TONES.bandEdge.stroke}
              />
            </g>
          ) : null}
          {lines.map((l) => (
            <g key={l.id} aria-hidden="true" data-series={l.id}>
              <path
                d={path(l.points)}
                fill="none"
                strokeWidth={2.5}
                strokeDasharray={l.dash}
                className={TONES[l.tone].stroke}
              />
              {l.markers
                ? l.points.map((p, i) => (
                    <rect key={i} x={sx(p.x) - 3} y={sy(p.y) - 3} width={6} height={6} className={TONES[l.tone].fill} />
                  ))
                : null}
            </g>
          ))}
          {targets.map((t) => {
            const cx = sx(t.x);
            const cy = sy(t.y);
            const on = String(t.key) === active;
            const r = t.large ? 6 : t.href ? 4.5 : 0;
            const shape = (
              <>
                <circle cx={cx} cy={cy} r={HIT} fill="transparent" />
                {r ? (
                  <circle
                    cx={cx}
                    cy={cy}
                    r={r}
                    className={`${TONES[t.tone].fill} ${TONES.card.stroke}`}
                    strokeWidth={1.5}
                  />
                ) : null}
                {on ? (
                  <circle cx={cx} cy={cy} r={r + 4} fill="none" strokeWidth={2} className={TONES.ink.stroke} />
                ) : null}
              </>
            );
            const handlers = {
              onFocus: () => setActive(String(t.key)),
              onBlur: () => setActive((a) => (a === String(t.key) ? null : a)),
              onMouseEnter: () => setActive(String(t.key)),
              onMouseLeave: () => setActive((a) => (a === String(t.key) ? null : a)),
            };
            return t.href ? (
              <a
                key={t.key}
                href={t.href}
                aria-label={t.name}
                data-entry-id={t.entryId}
                className="outline-none"
                {...handlers}
              >
                {shape}
              </a>
            ) : (
              <g
                key={t.key}
                tabIndex={0}
                role="img"
                aria-label={t.name}
                data-readout
                className="cursor-pointer outline-none"
                onClick={() => setActive(String(t.key))}
                {...handlers}
              >
                {shape}
              </g>
            );
          })}
          {mark ? (
            <g data-chart-mark tabIndex={0} role="img" aria-label={mark.label} className="outline-none">
              <circle cx={sx(mark.x)} cy={sy(mark.y)} r={HIT} fill="transparent" />
              <circle
                cx={sx(mark.x)}
                cy={sy(mark.y)}
                r={7}
                className={`${TONES.mine.fill} ${TONES.card.stroke}`}
                strokeWidth={2}
              />
              {shown ? null : labelBox(mark.label, sx(mark.x), sy(mark.y), 'mine', 'mark')}
            </g>
          ) : null}
          {shown
            ? labelBox(shown.label, sx(shown.x), sy(shown.y), shown.tone, 'active')
            : dots.filter((d) => d.pinned).map((d) => labelBox(d.label, sx(d.x), sy(d.y), d.tone, `pinned-${d.key}`))}
        </svg>
      </div>
      {legend?.length ? <Legend items={legend} /> : null}
      {caption || table ? (
        <figcaption className="cw-muted font-sans text-xs">
          {caption}
          {table ? <ChartTable data={table} /> : null}
        </figcaption>
      ) : null}
    </figure>
  );
}
