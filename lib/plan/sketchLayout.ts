/**
 * The site sketch's drawing and its labels' places, at any width: the ground, the source,
 * the pipes, the pumps and the tank as points in px, then each label put beside the part
 * it names where it overlaps no other label and no drawn part. Not to scale: the shape
 * says what is where, the labels give the numbers. Pure, no framework.
 */
import { overlaps, textWidth, wrapText } from '@/lib/charts/layout';

export type Box = [x: number, y: number, w: number, h: number];
export interface Point {
  x: number;
  y: number;
}

export type SketchPart = 'source' | 'supply' | 'drive' | 'fall' | 'pumps' | 'delivery' | 'lift' | 'tank' | 'stage';

export interface SketchGeometry {
  width: number;
  height: number;
  /** the pool at the source: its surface y and the outline of its bed */
  surfaceY: number;
  pool: Point[];
  ground: Point[];
  /** present when the plan needs a standpipe: its box, and the supply pipe into it */
  standpipe: Box | null;
  supplyPipe: Point[];
  drivePipe: Point[];
  /** the lower pumps (count drawn, at most three) and their air chambers */
  pumps: Box[];
  chambers: Box[];
  deliveryPipe: Point[];
  /** staged: the tank partway up and the upper pump beside it */
  stageTank: Box | null;
  upperPump: Box | null;
  upperDelivery: Point[];
  tank: Box;
  fallDim: { x: number; from: number; to: number; extension: Point[] };
  liftDim: { x: number; from: number; to: number; extensions: Point[][] };
  /** where each part's label points */
  anchors: Partial<Record<SketchPart, Point>>;
  /** the corner note that says the sketch is not to scale */
  note: Box;
}

export interface SketchOptions {
  standpipe: boolean;
  staged: boolean;
  pumps: number;
  font?: number;
}

/** The drawing at `width` × `height` px. */
export function sketchGeometry(width: number, height: number, o: SketchOptions): SketchGeometry {
  const W = width;
  const H = height;
  const X = (f: number) => Math.round(f * W);
  const Y = (f: number) => Math.round(f * H);
  const font = o.font ?? 12;
  const surfaceY = Y(0.3);
  const pumpY = Y(0.8);
  const groundAtPump = pumpY + 8;
  const tankTop = Y(0.08);
  const tankBottom = Y(0.24);
  const pool = [
    { x: X(0.04), y: surfaceY },
    { x: X(0.07), y: surfaceY + Y(0.09) },
    { x: X(0.17), y: surfaceY + Y(0.09) },
    { x: X(0.2), y: surfaceY },
  ];
  const bankEnd = o.standpipe ? X(0.31) : X(0.24);
  const pumpX = X(0.44);
  const tankX = Math.min(X(0.8), W - 24 - Math.max(40, X(0.1)));
  const tankW = Math.max(40, X(0.1));
  const ground = [
    { x: 0, y: surfaceY },
    ...pool,
    { x: bankEnd, y: surfaceY },
    { x: pumpX - 14, y: groundAtPump },
    { x: X(0.56), y: groundAtPump },
    { x: tankX - 6, y: tankBottom },
    { x: W, y: tankBottom },
  ];
  const intake = { x: X(0.12), y: surfaceY + Y(0.055) };
  const pumpW = 24;
  const pumpH = 12;
  const pumpTop = pumpY - pumpH;
  // the drive pipe leaves the pool through its bank and lies on the slope down to the pump
  const slopeTop = { x: bankEnd, y: surfaceY };
  const slopeFoot = { x: pumpX - 14, y: groundAtPump };
  const onSlope = (y: number) => ({
    x: slopeTop.x + ((slopeFoot.x - slopeTop.x) * (y - slopeTop.y)) / (slopeFoot.y - slopeTop.y),
    y: y - 5,
  });
  let standpipe: Box | null = null;
  let supplyPipe: Point[] = [];
  let drivePipe: Point[];
  if (o.standpipe) {
    // the supply pipe brings the water to a standpipe at the top of the slope; the drive pipe starts there
    const sx = bankEnd - 16;
    standpipe = [sx, surfaceY - Y(0.1), 12, Y(0.1) - 1];
    supplyPipe = [intake, { x: X(0.22), y: intake.y }, { x: X(0.22), y: surfaceY - 5 }, { x: sx, y: surfaceY - 5 }];
    drivePipe = [{ x: sx + 12, y: surfaceY - 5 }, onSlope(surfaceY), { x: pumpX, y: pumpY - 4 }];
  } else {
    const at = onSlope(intake.y + 5);
    drivePipe = [intake, at, { x: pumpX, y: pumpY - 4 }];
  }
  const drawn = Math.max(1, Math.min(3, o.pumps));
  // more pumps stand side by side behind the first, each a little up and to the right
  const pumps: Box[] = [];
  const chambers: Box[] = [];
  for (let i = drawn - 1; i >= 0; i--) {
    pumps.push([pumpX + i * 6, pumpTop - i * 6, pumpW, pumpH]);
    chambers.push([pumpX + i * 6 + pumpW - 11, pumpTop - i * 6 - 14, 9, 14]);
  }
  const outX = pumpX + pumpW + (drawn - 1) * 6;
  // over the tank's rim: up its side, across, and down through the lid
  const inlet = [
    { x: tankX - 5, y: tankBottom - 6 },
    { x: tankX - 5, y: tankTop - 7 },
    { x: tankX + 12, y: tankTop - 7 },
    { x: tankX + 12, y: tankTop + 4 },
  ];
  const climb = (t: number) => ({
    x: X(0.56) + (tankX - 6 - X(0.56)) * t,
    y: groundAtPump + (tankBottom - groundAtPump) * t - 6,
  });
  let deliveryPipe: Point[];
  let stageTank: Box | null = null;
  let upperPump: Box | null = null;
  let upperDelivery: Point[] = [];
  if (o.staged) {
    // a terrace halfway up: the stage tank at its back, the upper pump at its front edge
    const a = { x: climb(0.42).x, y: climb(0.42).y + 6 };
    const b = { x: a.x + Math.max(34, X(0.07)), y: a.y };
    ground.splice(ground.length - 2, 0, a, b);
    stageTank = [a.x + 2, a.y - 20, 16, 20];
    upperPump = [b.x - 14, a.y - 8, 12, 8];
    deliveryPipe = [
      { x: outX, y: pumpY - 4 },
      climb(0),
      { x: a.x - 5, y: a.y - 6 },
      { x: a.x - 5, y: a.y - 26 },
      { x: a.x + 8, y: a.y - 26 },
      { x: a.x + 8, y: a.y - 18 },
    ];
    const rise = (t: number) => ({ x: b.x + (tankX - 6 - b.x) * t, y: b.y + (tankBottom - b.y) * t - 6 });
    upperDelivery = [{ x: b.x - 2, y: a.y - 4 }, rise(0), ...inlet];
  } else {
    deliveryPipe = [{ x: outX, y: pumpY - 4 }, climb(0), ...inlet];
  }
  const tank: Box = [tankX, tankTop, tankW, tankBottom - tankTop];
  const dimL = 6;
  const dimR = W - 6;
  const anchors: SketchGeometry['anchors'] = {
    source: { x: X(0.12), y: surfaceY - 2 },
    fall: { x: dimL, y: (surfaceY + pumpY) / 2 },
    drive: mid(drivePipe.at(-2)!, drivePipe.at(-1)!),
    pumps: { x: pumpX + pumpW / 2, y: pumpY + 2 },
    delivery: mid(deliveryPipe[1]!, deliveryPipe[2]!),
    lift: { x: dimR, y: (pumpY + tankTop) / 2 },
    tank: { x: tankX + tankW / 2, y: tankTop + (tankBottom - tankTop) / 2 },
  };
  if (standpipe) anchors.supply = { x: standpipe[0] + 6, y: standpipe[1] };
  if (stageTank) anchors.stage = { x: stageTank[0] + stageTank[2] / 2, y: stageTank[1] };
  const noteW = textWidth('Not to scale', font) + 4;
  return {
    width: W,
    height: H,
    surfaceY,
    pool,
    ground,
    standpipe,
    supplyPipe,
    drivePipe,
    pumps,
    chambers,
    deliveryPipe,
    stageTank,
    upperPump,
    upperDelivery,
    tank,
    fallDim: {
      x: dimL,
      from: surfaceY,
      to: pumpY,
      extension: [
        { x: dimL - 4, y: pumpY },
        { x: pumpX - 2, y: pumpY },
      ],
    },
    liftDim: {
      x: dimR,
      from: pumpY,
      to: tankTop,
      extensions: [
        [
          { x: outX + 4, y: pumpY },
          { x: dimR + 4, y: pumpY },
        ],
        [
          { x: tankX + tankW + 2, y: tankTop },
          { x: dimR + 4, y: tankTop },
        ],
      ],
    },
    anchors,
    note: [W - noteW - 2, H - font - 6, noteW, font + 4],
  };
}

const mid = (a: Point, b: Point): Point => ({ x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 });

/** A line drawn as small boxes along it, so a label can be kept off it. */
export function lineBoxes(points: Point[], pad = 3, step = 6): Box[] {
  const out: Box[] = [];
  for (let i = 1; i < points.length; i++) {
    const a = points[i - 1]!;
    const b = points[i]!;
    const n = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / step));
    for (let k = 0; k <= n; k++) {
      const x = a.x + ((b.x - a.x) * k) / n;
      const y = a.y + ((b.y - a.y) * k) / n;
      out.push([x - pad, y - pad, 2 * pad, 2 * pad]);
    }
  }
  return out;
}

/** Everything drawn that a label must not cover. */
export function sketchObstacles(g: SketchGeometry): Box[] {
  const pad = (b: Box, p = 3): Box => [b[0] - p, b[1] - p, b[2] + 2 * p, b[3] + 2 * p];
  return [
    ...lineBoxes(g.ground),
    ...lineBoxes(g.supplyPipe),
    ...lineBoxes(g.drivePipe),
    ...lineBoxes(g.deliveryPipe),
    ...lineBoxes(g.upperDelivery),
    ...lineBoxes(g.fallDim.extension, 2),
    ...g.liftDim.extensions.flatMap((e) => lineBoxes(e, 2)),
    ...lineBoxes([
      { x: g.fallDim.x, y: g.fallDim.from },
      { x: g.fallDim.x, y: g.fallDim.to },
    ]),
    ...lineBoxes([
      { x: g.liftDim.x, y: g.liftDim.from },
      { x: g.liftDim.x, y: g.liftDim.to },
    ]),
    ...[...g.pumps, ...g.chambers, g.tank, g.note].map((b) => pad(b)),
    ...(g.standpipe ? [pad(g.standpipe)] : []),
    ...(g.stageTank ? [pad(g.stageTank)] : []),
    ...(g.upperPump ? [pad(g.upperPump)] : []),
  ];
}

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
