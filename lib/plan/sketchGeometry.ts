/**
 * The site sketch's drawing at any width: the ground, the source, the pipes, the pumps
 * and the tank as points in px, and what of it a label must not cover. Not to scale: the
 * shape says what is where, the labels (sketchLayout.ts) give the numbers. Pure, no framework.
 */
import { textWidth } from '@/lib/charts/layout';

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
