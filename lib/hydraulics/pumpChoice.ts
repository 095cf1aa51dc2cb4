/**
 * Pump size choice: which ram size, how many, and whether in parallel or in
 * stages, from the flow the source spares in the driest month, the fall, the
 * lift and the daily demand.
 *
 * Each pump of size s runs on a drive flow inside its typical range
 * (pumpSizes.ts; common practice, no published source found) and delivers
 * q = η·Q·H/h_p (D'Aubuisson), with η the typical band at h_p/H
 * (efficiency.ts, Building Trades Pocketbook table) and h_p the lift plus the
 * delivery-line friction the reader accepts. The choice is the fewest pumps,
 * then the smallest size, that meet the demand with a margin; staging is used
 * only when one lift is beyond what a ram of this type reaches.
 */
import * as z from 'zod/mini';
import { PUMP_TYPES, efficiencyBand, maxLiftRatio, type PumpType } from './efficiency';
import { qty, say, type MessagePart } from './message';
import { NOMINAL_LABELS, NOMINAL_SIZES, type NominalSize } from './pipes';
import { PRACTICE, fallRarelyViable } from './practice';
import { PUMP_SIZE_SOURCE, typicalDriveFlow } from './pumpSizes';
import { fallM, flowM3s, liftM, parseInput, siNumber, addRangeIssue } from './schemaKit';

/** Delivery wanted over the demand before a plan is called "works" (common practice, no source). */
export const DESIGN_MARGIN = { value: 1.2, source: 'common practice, no published source found' } as const;

export const pumpChoiceSchema = z
  .object({
    fallM: fallM(),
    /** static lift from the pump to the tank's inlet, m */
    liftM: liftM(),
    /** flow the source can spare in the driest month, m³/s */
    spareFlowM3s: flowM3s(),
    demandM3PerDay: siNumber({ min: 0, minExclusive: true, max: 1000, unit: 'm³/day' }),
    pumpType: z._default(z.enum(PUMP_TYPES), 'homemade'),
    /** delivery-line friction accepted, as a share of the lift */
    deliveryLossShare: z._default(siNumber({ min: 0, max: 0.5, unit: '' }), PRACTICE.deliveryLossShare.value),
    maxPumps: z._default(siNumber({ min: 1, max: 20, unit: '', integer: true }), 6),
    /** the largest size the reader will build or buy; larger sizes are not offered */
    largestSize: z._default(z.enum(NOMINAL_SIZES), '4'),
  })
  .check(
    z.superRefine((v, ctx) => {
      if (v.liftM <= v.fallM)
        addRangeIssue(ctx, ['liftM'], say`must be greater than the fall (${qty('length', v.fallM)})`, {
          min: v.fallM,
          minExclusive: true,
          max: 1000,
          unit: 'm',
        });
    }),
  );
export type PumpChoiceInput = z.input<typeof pumpChoiceSchema>;

export interface PumpSet {
  size: NominalSize;
  count: number;
  /** drive flow each pump is tuned to, m³/s */
  driveFlowEachM3s: number;
  totalDriveFlowM3s: number;
  fallM: number;
  /** lift plus the accepted friction, m */
  pumpHeadM: number;
  efficiency: number;
  deliveredM3PerDay: number;
}

export interface PumpChoiceResults {
  arrangement: 'single' | 'parallel' | 'staged' | 'none';
  /** the pumps on the source (the lower stage when staged) */
  pumps: PumpSet | null;
  /** the upper stage, driven from the tank the lower pumps fill */
  upper?: PumpSet & { tankHeightM: number; liftM: number };
  targetM3PerDay: number;
  /** delivered at the top, m³/day */
  deliveredM3PerDay: number;
  meetsDemand: boolean;
  why: MessagePart[];
  nextSizeUp: MessagePart[];
  nextSizeDown: MessagePart[];
  driveFlowSource: string;
}

interface Stage {
  fallM: number;
  pumpHeadM: number;
  efficiency: number;
  /** cap on the total drive flow (the source), m³/s; undefined for a stage fed from a tank */
  available?: number;
}

const perDay = (q: number) => q * 86400;

/** n pumps of size s on a stage: the drive flow each is tuned to, and what they deliver. */
function evaluate(stage: Stage, size: NominalSize, n: number, needDrive: number): PumpSet | null {
  const { lowM3s, highM3s } = typicalDriveFlow(size);
  const cap = Math.min(highM3s, stage.available === undefined ? highM3s : stage.available / n);
  if (cap < lowM3s || stage.efficiency <= 0) return null;
  const Q = Math.min(cap, Math.max(lowM3s, needDrive / n));
  const q = (stage.efficiency * Q * stage.fallM) / stage.pumpHeadM;
  return {
    size,
    count: n,
    driveFlowEachM3s: Q,
    totalDriveFlowM3s: n * Q,
    fallM: stage.fallM,
    pumpHeadM: stage.pumpHeadM,
    efficiency: stage.efficiency,
    deliveredM3PerDay: perDay(n * q),
  };
}

/** Fewest pumps, then the smallest size, that deliver `need` m³/s; else the set that delivers most. */
function choose(
  stage: Stage,
  need: number,
  maxPumps: number,
  sizes: readonly NominalSize[],
): { set: PumpSet | null; meets: boolean } {
  const needDrive = stage.efficiency > 0 ? (need * stage.pumpHeadM) / (stage.efficiency * stage.fallM) : Infinity;
  let best: PumpSet | null = null;
  for (let n = 1; n <= maxPumps; n++) {
    for (const s of sizes) {
      const set = evaluate(stage, s, n, needDrive);
      if (!set) continue;
      if (set.deliveredM3PerDay >= perDay(need) * (1 - 1e-9)) return { set, meets: true };
      if (!best || set.deliveredM3PerDay > best.deliveredM3PerDay) best = set;
    }
  }
  return { set: best, meets: false };
}

const label = (s: NominalSize) => NOMINAL_LABELS[s];

/** Why the next size up and down are worse, for a chosen set on its stage. */
function neighbours(
  stage: Stage,
  set: PumpSet,
  need: number,
  sizes: readonly NominalSize[],
): { up: MessagePart[]; down: MessagePart[] } {
  const i = NOMINAL_SIZES.indexOf(set.size);
  const n = set.count;
  // "A ¾" pump needs" or "3 ¾" pumps need": the sentence follows the count
  const who = (s: NominalSize, one: string, many: string) =>
    n > 1 ? `${n} ${label(s)} pumps ${many}` : `A ${label(s)} pump ${one}`;
  const each = n > 1 ? ' each' : '';
  const needDrive = (need * stage.pumpHeadM) / (stage.efficiency * stage.fallM);
  const downSize = NOMINAL_SIZES[i - 1];
  const upSize = NOMINAL_SIZES[i + 1];
  let down: MessagePart[] = [`${label(set.size)} is the smallest size in the table.`];
  if (downSize) {
    const r = typicalDriveFlow(downSize);
    const cap = Math.min(r.highM3s, stage.available === undefined ? r.highM3s : stage.available / n);
    const most = perDay((stage.efficiency * cap * stage.fallM * n) / stage.pumpHeadM);
    down = evaluate(stage, downSize, n, needDrive)
      ? say`${who(downSize, 'delivers', 'deliver')} at most ${qty('dailyVolume', most)}, less than the ${qty('dailyVolume', perDay(need))} wanted.`
      : say`${who(downSize, 'needs', 'need')} at least ${qty('flow', r.lowM3s)}${each} of drive water.`;
  }
  let up: MessagePart[] = [`${label(set.size)} is the largest size in the table.`];
  if (upSize && !sizes.includes(upSize)) up = [`${label(set.size)} is the largest size you build.`];
  else if (upSize) {
    const r = typicalDriveFlow(upSize);
    const avail = stage.available === undefined ? undefined : stage.available / n;
    if (avail !== undefined && r.lowM3s > avail)
      up = say`${who(upSize, 'needs', 'need')} at least ${qty('flow', r.lowM3s)}${each} of drive water; the source spares ${qty('flow', avail)}${n > 1 ? ' for each' : ''}.`;
    else if (r.lowM3s * n > needDrive)
      up = say`${who(upSize, 'beats', 'beat')} steadily only on ${qty('flow', r.lowM3s)}${each} or more, more drive water than this demand needs; it takes more from the stream and costs more.`;
    else
      up = say`${who(upSize, 'would', 'would')} do the same job with ${n > 1 ? 'larger, heavier pumps and drive pipes' : 'a larger, heavier pump and drive pipe'}; nothing is gained.`;
  }
  return { up, down };
}

/**
 * Chooses the pump size, count and arrangement.
 *
 * Formulas: h_p = h·(1 + s) with s the accepted friction share; r = h_p/H; η = typical band at r;
 * drive flow needed Q_n = D·h_p/(η·H) for a target D = 1.2 × demand; n pumps of size s each run on
 * clamp(Q_n/n, Q_low, min(Q_high, Q_spare/n)) and deliver n·η·Q·H/h_p; when no set meets 1.2 × demand,
 * the fewest that meet the demand itself. Staged (r ≥ r_max): the lower pumps lift to a tank at
 * h₁ = √(h·H); upper pumps beside them, driven by the fall h₁ from that tank, lift to h, so both stages
 * work at the ratio √(h/H) (common practice, no source); the lower stage must deliver the upper drive flow.
 * Units: SI; demand m³/day. Range: as the schema.
 * Reference: D'Aubuisson relation; drive flow ranges pumpSizes.ts (common practice, no published
 * source found); efficiency bands efficiency.ts (Building Trades Pocketbook × 0.33/0.66 for homemade).
 * @example a brook spares 10 US gal/min, 4 ft fall, 29 ft lift, 200 L/day: one ½" pump
 * // h_p = 8.8392 × 1.1 = 9.723 m, r = 7.975, η = 0.5 × (0.61 − 0.09 × 0.9875) = 0.2606
 * // need 240 L/day = 2.778e-6 m³/s → Q = 2.778e-6 × 9.723/(0.2606 × 1.2192) = 8.50e-5 m³/s (1.35 gal/min): ½" runs at 1.35 gal/min
 * const r = choosePump({ fallM: 1.2192, liftM: 8.8392, spareFlowM3s: toSI(10, 'gal/min', 'flow'), demandM3PerDay: 0.2 })
 * r.arrangement  // → 'single'
 * r.pumps.size  // → '1/2'
 * r.pumps.efficiency  // ≈ 0.2606
 * r.deliveredM3PerDay  // ≈ 0.24
 */
export function choosePump(input: PumpChoiceInput): PumpChoiceResults {
  const v = parseInput(pumpChoiceSchema, input);
  const sizes = NOMINAL_SIZES.slice(0, NOMINAL_SIZES.indexOf(v.largestSize) + 1);
  const H = v.fallM;
  const target = (v.demandM3PerDay * DESIGN_MARGIN.value) / 86400;
  const share = 1 + v.deliveryLossShare;
  const hp = v.liftM * share;
  const rMax = maxLiftRatio(v.pumpType);
  const none = (why: MessagePart[]): PumpChoiceResults => ({
    arrangement: 'none',
    pumps: null,
    targetM3PerDay: perDay(target),
    deliveredM3PerDay: 0,
    meetsDemand: false,
    why,
    nextSizeUp: [],
    nextSizeDown: [],
    driveFlowSource: PUMP_SIZE_SOURCE,
  });
  if (fallRarelyViable(H))
    return none(
      say`A fall of ${qty('length', H)} is at or below the ${qty('length', PRACTICE.minFallM.value)} a ram needs to beat reliably (${PRACTICE.minFallM.source}).`,
    );
  const smallest = typicalDriveFlow('1/2').lowM3s;
  if (v.spareFlowM3s < smallest)
    return none(
      say`The source spares ${qty('flow', v.spareFlowM3s)}, less than the ${qty('flow', smallest)} the smallest (½") ram needs to beat.`,
    );
  const eta = (ratio: number) => efficiencyBand(v.pumpType as PumpType, ratio).typical;
  const single: Stage = { fallM: H, pumpHeadM: hp, efficiency: eta(hp / H), available: v.spareFlowM3s };

  if (hp / H < rMax && single.efficiency > 0) {
    const withMargin = choose(single, target, v.maxPumps, sizes);
    const { set, meets } = withMargin.meets
      ? withMargin
      : choose(single, target / DESIGN_MARGIN.value, v.maxPumps, sizes);
    if (!set) return none(['No size runs on this source.']);
    const need = withMargin.meets ? target : target / DESIGN_MARGIN.value;
    const wanted = withMargin.meets ? ' (the demand and a fifth more)' : ' (the demand, with no margin)';
    const nb = neighbours(single, set, need, sizes);
    const arrangement = set.count === 1 ? 'single' : 'parallel';
    const why =
      set.count === 1
        ? say`One ${label(set.size)} pump on ${qty('flow', set.driveFlowEachM3s)} of drive water delivers ${qty('dailyVolume', set.deliveredM3PerDay)}, at least the ${qty('dailyVolume', perDay(need))} wanted${wanted}.`
        : say`No single size delivers the ${qty('dailyVolume', perDay(need))} wanted${wanted} on what the source spares; ${set.count} ${label(set.size)} pumps in parallel, each on ${qty('flow', set.driveFlowEachM3s)}, deliver ${qty('dailyVolume', set.deliveredM3PerDay)}.`;
    return {
      arrangement,
      pumps: set,
      targetM3PerDay: perDay(target),
      deliveredM3PerDay: set.deliveredM3PerDay,
      meetsDemand: set.deliveredM3PerDay >= v.demandM3PerDay * (1 - 1e-9),
      why: meets ? why : say`${why} This is the most any ${v.maxPumps} pumps deliver here.`,
      nextSizeUp: nb.up,
      nextSizeDown: nb.down,
      driveFlowSource: PUMP_SIZE_SOURCE,
    };
  }

  // staged: the lower pumps fill a tank at h₁ = √(h·H); the upper pumps stand beside them, driven by the
  // fall h₁ from that tank, so both stages work at the same ratio √(h/H)
  const h1 = Math.sqrt(v.liftM * H);
  const upper: Stage = { fallM: h1, pumpHeadM: v.liftM * share, efficiency: eta((v.liftM * share) / h1) };
  const lower: Stage = {
    fallM: H,
    pumpHeadM: h1 * share,
    efficiency: eta((h1 * share) / H),
    available: v.spareFlowM3s,
  };
  if (upper.efficiency <= 0 || lower.efficiency <= 0)
    return none(
      say`A lift of ${qty('length', v.liftM)} is ${(v.liftM / H).toFixed(0)} times the fall; even in two stages each would be beyond the ${rMax} times a ${v.pumpType} ram reaches.`,
    );
  const pick = (stage: Stage, need: number) => {
    const first = choose(stage, need, v.maxPumps, sizes);
    return first.meets ? first : choose(stage, need / DESIGN_MARGIN.value, v.maxPumps, sizes);
  };
  const up = pick(upper, target);
  if (!up.set) return none(['No size suits the upper stage.']);
  // the lower pumps must fill the tank with what the upper pumps use
  const low = pick(lower, up.set.totalDriveFlowM3s);
  if (!low.set) return none(['No size runs on this source for the lower stage.']);
  const duty = Math.min(1, low.set.deliveredM3PerDay / perDay(up.set.totalDriveFlowM3s));
  const top = up.set.deliveredM3PerDay * duty;
  const nb = neighbours(lower, low.set, up.set.totalDriveFlowM3s, sizes);
  const pumps = (p: PumpSet, verb: string, verbs: string) =>
    p.count > 1 ? `${p.count} ${label(p.size)} pumps ${verb}` : `one ${label(p.size)} pump ${verbs}`;
  return {
    arrangement: 'staged',
    pumps: low.set,
    upper: { ...up.set, tankHeightM: h1, liftM: v.liftM },
    targetM3PerDay: perDay(target),
    deliveredM3PerDay: top,
    meetsDemand: top >= v.demandM3PerDay * (1 - 1e-9),
    why: say`A lift ${(v.liftM / H).toFixed(0)} times the fall is beyond the ${rMax} times one ${v.pumpType} ram reaches: ${pumps(low.set, 'on the source fill', 'on the source fills')} a tank ${qty('length', h1)} up, and ${pumps(up.set, 'beside it, driven by the fall from that tank, lift', 'beside it, driven by the fall from that tank, lifts')} to the top, delivering ${qty('dailyVolume', top)}.`,
    nextSizeUp: nb.up,
    nextSizeDown: nb.down,
    driveFlowSource: PUMP_SIZE_SOURCE,
  };
}
