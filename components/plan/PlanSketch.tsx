'use client';

import { useMemo } from 'react';
import type { SitePlanResults } from '@/lib/hydraulics';
import { sketchOptions, sketchSummary, sketchTexts } from '@/lib/plan/sketch';
import { layoutSketch, type Box, type Point } from '@/lib/plan/sketchLayout';
import { useWidth } from '@/components/charts/useWidth';
import { AREA, LINE, TEXT } from '@/components/drawing-colours';
import { useUnits } from '@/components/units/UnitsProvider';
import { usePrinting } from './usePrinting';

const FONT = 12;
const STEP = 15;
const HALO = 'fill-limestone-50 dark:fill-creek-900';

const poly = (pts: Point[]) => pts.map((p, i) => `${i ? 'L' : 'M'}${p.x.toFixed(1)},${p.y.toFixed(1)}`).join('');
const rect = ([x, y, width, height]: Box) => ({ x, y, width, height });

/**
 * The site from the side, drawn from the plan: source, standpipe if any, drive pipe down
 * the fall, the pumps, the delivery line up the lift, the tank, each part labelled with
 * its numbers in the reader's units. Not to scale; laid out afresh at the card's width.
 */
export function PlanSketch({ results, printWidth }: { results: SitePlanResults; printWidth: number }) {
  const { units } = useUnits();
  const [ref, measured] = useWidth<HTMLDivElement>();
  const width = usePrinting() ? printWidth : measured;
  const options = sketchOptions(results);
  const texts = sketchTexts(results, units);
  // laying the labels out takes a few milliseconds; most keystrokes change none of them
  const key = JSON.stringify([texts, options, width]);
  const layout = useMemo(
    () => (options ? layoutSketch(texts, width, { ...options, font: FONT, line: STEP }) : null),
    // eslint-disable-next-line react-hooks/exhaustive-deps -- the key holds everything the layout reads
    [key],
  );
  if (!layout) return null;
  const { geometry: g, labels, height } = layout;
  const [tx, ty, tw, th] = g.tank;
  const arrow = (x: number, from: number, to: number) => {
    const d = Math.sign(to - from) * 6;
    return `M${x},${from}V${to}M${x - 4},${from + d}L${x},${from}L${x + 4},${from + d}M${x - 4},${to - d}L${x},${to}L${x + 4},${to - d}`;
  };
  return (
    <section aria-labelledby="plan-sketch" className="cw-card flex flex-col gap-2 font-sans" data-testid="plan-sketch">
      <h2 id="plan-sketch" className="font-serif text-xl font-semibold">
        The site
      </h2>
      <div ref={ref} className="w-full min-w-0">
        <svg
          width={width}
          height={height}
          viewBox={`0 0 ${width} ${height}`}
          role="img"
          aria-label={sketchSummary(texts)}
          className="block h-auto max-w-full select-none font-sans"
          fontSize={FONT}
        >
          {/* the pool at the source and the ground: down the fall to the pumps, up the lift to the tank */}
          <path d={`${poly(g.pool)}Z`} className={AREA.water} />
          <path d={poly(g.ground)} fill="none" strokeWidth={2.5} strokeLinejoin="round" className={LINE.ground} />
          <line
            x1={g.pool[0]!.x}
            x2={g.pool.at(-1)!.x}
            y1={g.surfaceY}
            y2={g.surfaceY}
            strokeWidth={2}
            className={LINE.water}
          />
          <rect {...rect([tx, ty + th * 0.35, tw, th * 0.65])} className={AREA.water} />
          <g fill="none" strokeWidth={4} strokeLinecap="round" strokeLinejoin="round" className={LINE.ink}>
            {[g.supplyPipe, g.drivePipe, g.deliveryPipe, g.upperDelivery]
              .filter((p) => p.length > 1)
              .map((p, i) => (
                <path key={i} d={poly(p)} />
              ))}
          </g>
          <g strokeWidth={2} className={LINE.ink}>
            {g.standpipe ? <rect {...rect(g.standpipe)} className={`${AREA.paper} ${LINE.ink}`} /> : null}
            {g.pumps.map((b, i) => (
              <g key={i}>
                <rect {...rect(g.chambers[i]!)} rx={4} className={`${AREA.paper} ${LINE.ink}`} />
                <rect {...rect(b)} rx={2} className={`${AREA.paper} ${LINE.ink}`} />
              </g>
            ))}
            {g.stageTank ? <rect {...rect(g.stageTank)} fill="none" /> : null}
            {g.upperPump ? <rect {...rect(g.upperPump)} rx={2} className={`${AREA.paper} ${LINE.ink}`} /> : null}
            <rect {...rect(g.tank)} rx={2} fill="none" />
          </g>
          {/* dimension lines: the fall at the left edge, the lift at the right, from the pumps' level */}
          <g fill="none" strokeWidth={1.2} className={LINE.ink}>
            <path d={poly(g.fallDim.extension)} strokeDasharray="4 3" />
            {g.liftDim.extensions.map((e, i) => (
              <path key={i} d={poly(e)} strokeDasharray="4 3" />
            ))}
            <path d={arrow(g.fallDim.x, g.fallDim.from, g.fallDim.to)} strokeWidth={1.5} />
            <path d={arrow(g.liftDim.x, g.liftDim.from, g.liftDim.to)} strokeWidth={1.5} />
          </g>
          {labels.map((l) =>
            l.leader ? (
              <g key={`leader-${l.id}`} className={LINE.ink}>
                <line x1={l.leader[0].x} y1={l.leader[0].y} x2={l.leader[1].x} y2={l.leader[1].y} strokeWidth={1} />
                <circle cx={l.anchor.x} cy={l.anchor.y} r={2.5} className={TEXT.ink} />
              </g>
            ) : null,
          )}
          {labels.map((l) => (
            <g key={l.id} data-sketch-label={l.id}>
              <rect {...rect(l.box)} rx={3} className={HALO} />
              {l.lines.map((t, i) => (
                <text
                  key={i}
                  x={l.box[0] + 3}
                  y={l.box[1] + 2 + (i + 1) * STEP - 4}
                  fontWeight={i === 0 ? 700 : 400}
                  className={`${TEXT.ink} tabular-nums`}
                >
                  {i < l.lines.length - 1 ? `${t} ` : t}
                </text>
              ))}
            </g>
          ))}
          {labels
            .filter((l) => l.key)
            .map((l) => (
              <g key={`key-${l.id}`} aria-hidden="true">
                <circle cx={l.anchor.x} cy={l.anchor.y} r={8} className={`${HALO} ${LINE.ink}`} strokeWidth={1.5} />
                <text x={l.anchor.x} y={l.anchor.y + 4} textAnchor="middle" fontSize={10} className={TEXT.ink}>
                  {l.key}
                </text>
              </g>
            ))}
          <text x={g.note[0] + 2} y={g.note[1] + FONT} fontStyle="italic" className={TEXT.ink} data-sketch-note>
            Not to scale
          </text>
        </svg>
      </div>
    </section>
  );
}
