/**
 * The site sketch's labels: each put beside the part it names where it overlaps no other
 * label and no drawn part (sketchGeometry.ts draws the parts), the sketch drawn taller
 * on a narrow screen until they all find room. Pure, no framework.
 */
import { overlaps, textWidth, wrapText } from '@/lib/charts/layout';
import {
  lineBoxes,
  sketchGeometry,
  sketchObstacles,
  type Box,
  type Point,
  type SketchGeometry,
  type SketchOptions,
  type SketchPart,
} from './sketchGeometry';

export type { Box, Point, SketchGeometry, SketchOptions, SketchPart } from './sketchGeometry';
export { lineBoxes, sketchGeometry, sketchObstacles } from './sketchGeometry';

export interface LabelText {
  id: SketchPart;
  title: string;
  /** the numbers, a phrase a line where they fit: ['1¼" PVC pipe, sch 40', '24 ft long'] */
  value: string[];
}

export interface PlacedLabel {
  id: SketchPart;
  /** the first line is the part's name, the rest its numbers */
  lines: string[];
  box: Box;
  anchor: Point;
  /** from the anchor to the label's edge, when it stands away from what it names */
  leader: [Point, Point] | null;
  /** a label in the band under the drawing: its number, also marked on the part */
  key?: number;
}

type Side = 'right' | 'left' | 'below' | 'above' | 'above-right' | 'below-right' | 'above-left' | 'below-left';
const SIDES: Side[] = ['right', 'below', 'left', 'above', 'below-right', 'above-right', 'below-left', 'above-left'];
/** Where each part's label reads best, before any other side is tried. */
const PREFER: Record<SketchPart, Side[]> = {
  source: ['above', 'above-right', 'above-left'],
  supply: ['above-right', 'right', 'above'],
  fall: ['right', 'below-right'],
  drive: ['left', 'below-left', 'below'],
  pumps: ['below-left', 'below', 'below-right'],
  delivery: ['below-right', 'right', 'below'],
  lift: ['left', 'below-left', 'above-left'],
  tank: ['left', 'below', 'below-left'],
  stage: ['above-left', 'above', 'left'],
};
const GAPS = [6, 16, 30, 50];
/** A label farther than this from its part goes in the numbered band instead: a long leader reads as a wire. */
const MAX_LEADER = 64;

function candidate(side: Side, a: Point, w: number, h: number, gap: number): Box {
  switch (side) {
    case 'right':
      return [a.x + gap, a.y - h / 2, w, h];
    case 'left':
      return [a.x - gap - w, a.y - h / 2, w, h];
    case 'below':
      return [a.x - w / 2, a.y + gap, w, h];
    case 'above':
      return [a.x - w / 2, a.y - gap - h, w, h];
    case 'above-right':
      return [a.x + gap * 0.7, a.y - gap * 0.7 - h, w, h];
    case 'below-right':
      return [a.x + gap * 0.7, a.y + gap * 0.7, w, h];
    case 'above-left':
      return [a.x - gap * 0.7 - w, a.y - gap * 0.7 - h, w, h];
    case 'below-left':
      return [a.x - gap * 0.7 - w, a.y + gap * 0.7, w, h];
  }
}

/** The nearest point of a box to p. */
function nearest(b: Box, p: Point): Point {
  return { x: Math.min(Math.max(p.x, b[0]), b[0] + b[2]), y: Math.min(Math.max(p.y, b[1]), b[1] + b[3]) };
}

/**
 * A label's phrases as few lines as fit `limit` px: neighbours joined with a comma while
 * they fit, a phrase too long for a line wrapped at its spaces.
 */
export function joinPhrases(phrases: string[], limit: number, font: number): string[] {
  const out: string[] = [];
  let line = '';
  for (const p of phrases) {
    const next = line ? `${line}, ${p}` : p;
    if (textWidth(next, font) <= limit) line = next;
    else {
      if (line) out.push(`${line},`);
      const wrapped = wrapText(p, limit, font);
      line = wrapped.pop() ?? '';
      out.push(...wrapped);
    }
  }
  if (line) out.push(line);
  return out;
}

export interface SketchLabels {
  labels: PlacedLabel[];
  /** labels that found no room (the caller draws the sketch taller and tries again) */
  unplaced: SketchPart[];
}

/**
 * Each label, in the order given, at the first place beside its anchor (its preferred
 * sides first, nearest first) that stays inside the drawing and overlaps neither a
 * drawn part nor a label already placed. Text is measured on the generous side
 * (lib/charts/layout), so boxes that do not overlap here do not in the browser.
 */
export function placeSketchLabels(
  texts: LabelText[],
  g: SketchGeometry,
  { font = 12, line = 15, maxWidth }: { font?: number; line?: number; maxWidth?: number } = {},
): SketchLabels {
  const limit = maxWidth ?? Math.min(200, Math.max(100, g.width * 0.34));
  const taken = sketchObstacles(g);
  const boxes: Box[] = [];
  const labels: PlacedLabel[] = [];
  const unplaced: SketchPart[] = [];
  const inside = (b: Box) => b[0] >= 1 && b[1] >= 1 && b[0] + b[2] <= g.width - 1 && b[1] + b[3] <= g.height - 1;
  for (const t of texts) {
    const anchor = g.anchors[t.id];
    if (!anchor) continue;
    const lines = [...wrapText(t.title, limit, font), ...joinPhrases(t.value, limit, font)];
    const w = Math.ceil(Math.max(...lines.map((l) => textWidth(l, font)))) + 6;
    const h = lines.length * line + 4;
    // only what lies within reach of this label can be in its way
    const reach: Box = [
      anchor.x - MAX_LEADER - w,
      anchor.y - MAX_LEADER - h,
      2 * (MAX_LEADER + w),
      2 * (MAX_LEADER + h),
    ];
    const near = taken.filter((o) => overlaps(o, reach));
    const nearLabels = boxes.filter((o) => overlaps(o, reach));
    const free = (b: Box) => inside(b) && !near.some((o) => overlaps(o, b));
    const order = [...PREFER[t.id], ...SIDES.filter((s) => !PREFER[t.id].includes(s))];
    let found: Box | null = null;
    search: for (const gap of GAPS)
      for (const side of order) {
        const b = candidate(side, anchor, w, h, gap);
        if (free(b)) {
          found = b;
          break search;
        }
      }
    // nothing beside it: the nearest free place anywhere, joined to its part by a leader
    // that crosses no other label
    if (!found) {
      const spots: { b: Box; d: number }[] = [];
      for (let y = Math.max(1, reach[1]); y + h <= Math.min(g.height - 1, reach[1] + reach[3]); y += 6)
        for (let x = Math.max(1, reach[0]); x + w <= Math.min(g.width - 1, reach[0] + reach[2]); x += 6) {
          const b: Box = [x, y, w, h];
          const e = nearest(b, anchor);
          spots.push({ b, d: Math.hypot(e.x - anchor.x, e.y - anchor.y) });
        }
      spots.sort((a, b) => a.d - b.d);
      found =
        spots.find(({ b, d }) => {
          if (d > MAX_LEADER || !free(b)) return false;
          const leader = lineBoxes([anchor, nearest(b, anchor)], 1);
          return !leader.some((p) => nearLabels.some((o) => overlaps(o, p)));
        })?.b ?? null;
    }
    if (!found) {
      unplaced.push(t.id);
      continue;
    }
    const edge = nearest(found, anchor);
    const far = Math.hypot(edge.x - anchor.x, edge.y - anchor.y) > 10;
    taken.push(found);
    boxes.push(found);
    // a later label keeps off this one's leader too
    if (far) taken.push(...lineBoxes([anchor, edge], 2).slice(1));
    labels.push({ id: t.id, lines, box: found, anchor, leader: far ? [anchor, edge] : null });
  }
  return { labels, unplaced };
}

/**
 * The sketch at `width`: as short as lets every label find room beside its part (a phone
 * draws it taller than a desktop), up to twice its first height. A label that still finds
 * none goes in a band under the drawing, numbered, the same number marked on its part.
 */
export function layoutSketch(
  texts: LabelText[],
  width: number,
  o: SketchOptions & { line?: number },
): { geometry: SketchGeometry; labels: PlacedLabel[]; height: number } {
  const font = o.font ?? 12;
  const line = o.line ?? 15;
  const start = Math.round(Math.min(340, Math.max(260, width * 0.5)));
  let best: { geometry: SketchGeometry; placed: SketchLabels } | null = null;
  for (let height = start; height <= start * 2; height += 30) {
    const geometry = sketchGeometry(width, height, o);
    const placed = placeSketchLabels(texts, geometry, { font, line });
    if (!best || placed.unplaced.length < best.placed.unplaced.length) best = { geometry, placed };
    if (!placed.unplaced.length) break;
  }
  const { geometry, placed } = best!;
  const labels = [...placed.labels];
  let height = geometry.height;
  let x = 2;
  let rowTop = height + 4;
  let rowH = 0;
  placed.unplaced.forEach((id, i) => {
    const t = texts.find((e) => e.id === id)!;
    const limit = Math.max(100, width - 8);
    const lines = [`${i + 1}. ${t.title}`, ...joinPhrases(t.value, limit, font)];
    const w = Math.ceil(Math.max(...lines.map((l) => textWidth(l, font)))) + 6;
    const h = lines.length * line + 4;
    if (x > 2 && x + w > width - 2) {
      x = 2;
      rowTop += rowH + 4;
      rowH = 0;
    }
    labels.push({ id, lines, box: [x, rowTop, w, h], anchor: geometry.anchors[id]!, leader: null, key: i + 1 });
    x += w + 12;
    rowH = Math.max(rowH, h);
    height = rowTop + rowH + 2;
  });
  return { geometry, labels, height };
}
