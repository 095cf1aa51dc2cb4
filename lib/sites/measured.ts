/**
 * A site's field log tests against its plan: for each test, what the plan's pumps and
 * pipes would deliver at the fall, lift and drive flow measured that day (the array
 * planner, as the before/after comparison uses it), the delivery the bucket trials
 * measured, and the ratio of the two; then the trend of that ratio over time. No
 * database and no framework: the site page's loader hands the rows in.
 */
import { resolvePipe, type NominalSize, type PipeSeries, type PumpType, type SitePlanResults } from '@/lib/hydraulics';
import { layoutDelivery, type PumpLayout } from '@/lib/field-log/compare';
import { trialSpread, type TrialSI } from '@/lib/field-log/measure';

/** The pumps and pipes a plan builds, read back from a saved plan; null when it builds none or stages them. */
export interface PlanLayout extends PumpLayout {
  pumpSize: NominalSize;
  arrangement: 'single' | 'parallel';
  /** the drive flow the plan tunes all pumps to, m³/s */
  driveFlowM3s: number;
  driveSize: NominalSize;
  driveSeries: PipeSeries;
  deliverySize: NominalSize;
  deliverySeries: PipeSeries;
  /** what the plan expects at the top each day, m³/day */
  deliveredM3PerDay: number;
}

type SavedPlan = Partial<Pick<SitePlanResults, 'survey' | 'pump' | 'stages' | 'deliveredM3PerDay'>>;

function run(series: PipeSeries, nominal: NominalSize, lengthM: number) {
  const spec = resolvePipe(series, nominal);
  return {
    lengthM,
    insideDiameterM: spec.insideDiameterM,
    material: spec.material,
    wallThicknessM: spec.wallThicknessM,
  };
}

/**
 * The layout of a saved plan. A staged plan is left out: its top delivery hangs on two
 * stages, and a test records one pump's drive flow, so there is no fair prediction.
 */
export function planLayout(stored: Record<string, unknown>): PlanLayout | null {
  const plan = stored as SavedPlan;
  const pumps = plan.pump?.pumps;
  const stage = plan.stages?.[0];
  const arrangement = plan.pump?.arrangement;
  if (!plan.survey || !pumps || !stage || (arrangement !== 'single' && arrangement !== 'parallel')) return null;
  const { drivePipe: d, deliveryLine: l } = stage;
  return {
    pumpType: plan.survey.pumpType as PumpType,
    pumpSize: pumps.size,
    pumpCount: pumps.count,
    arrangement,
    fallM: plan.survey.fallM,
    liftM: plan.survey.liftM,
    driveFlowM3s: pumps.totalDriveFlowM3s,
    driveSize: d.nominal,
    driveSeries: d.series,
    drivePipe: run(d.series, d.nominal, d.lengthM),
    deliverySize: l.nominal,
    deliverySeries: l.series,
    deliveryLine: run(l.series, l.nominal, l.lengthM),
    waterTempC: plan.survey.waterTempC ?? null,
    deliveredM3PerDay: plan.deliveredM3PerDay ?? 0,
  };
}

/** A field log test as the comparison needs it (SI, as the store reads it). */
export interface SiteTest {
  id: number;
  /** YYYY-MM-DD */
  testedOn: string;
  fallM: number;
  liftM: number;
  driveFlowM3s: number;
  waterTempC: number | null;
  pumpSize: string;
  pumpCount: number;
  driveSize: string;
  deliverySize: string | null;
  trials: TrialSI[];
  hidden?: boolean;
}

export interface PlanVersionRef {
  version: number;
  /** ISO time the version was saved */
  createdAt: string;
  plan: Record<string, unknown>;
}

/** Where a test was recorded with other parts than its plan builds. */
export type LayoutDifference = 'pumpSize' | 'pumpCount' | 'driveSize' | 'deliverySize';

export interface MeasuredTest {
  id: number;
  testedOn: string;
  hidden: boolean;
  /** the plan version in force that day (the newest saved on or before it; the first for an earlier test) */
  planVersion: number;
  /** mean of the bucket trials, with the lowest and highest, m³/s */
  measured: { mean: number; min: number; max: number };
  /** what the plan's layout delivers at this test's fall, lift and drive flow, m³/s; null when it cannot say */
  predictedM3s: number | null;
  /** measured ÷ predicted (mean trial), or null without a prediction */
  ratio: number | null;
  differs: LayoutDifference[];
}

/** The version in force on a day: the newest saved on or before it, else the first. */
export function versionOn<V extends { createdAt: string }>(versions: readonly V[], day: string): V | undefined {
  const sorted = [...versions].sort((a, b) => a.createdAt.localeCompare(b.createdAt));
  let chosen = sorted[0];
  for (const v of sorted) if (v.createdAt.slice(0, 10) <= day) chosen = v;
  return chosen;
}

/**
 * Each test against the plan in force that day, oldest test first. The prediction runs
 * the plan's pumps and pipes at the test's own fall, lift, drive flow (an equal share
 * to each of the plan's pumps) and water temperature, so a drier month or a lower
 * stream is not held against the pump.
 */
export function measureAgainstPlan(tests: readonly SiteTest[], versions: readonly PlanVersionRef[]): MeasuredTest[] {
  const layouts = new Map(versions.map((v) => [v.version, planLayout(v.plan)]));
  return [...tests]
    .sort((a, b) => a.testedOn.localeCompare(b.testedOn) || a.id - b.id)
    .map((t) => {
      const v = versionOn(versions, t.testedOn);
      const layout = v ? (layouts.get(v.version) ?? null) : null;
      const measured = trialSpread(t.trials);
      const predictedM3s = layout ? predictedDelivery(layout, t) : null;
      return {
        id: t.id,
        testedOn: t.testedOn,
        hidden: t.hidden ?? false,
        planVersion: v?.version ?? 0,
        measured,
        predictedM3s,
        ratio: predictedM3s ? measured.mean / predictedM3s : null,
        differs: layout ? differences(layout, t) : [],
      };
    });
}

/** What a plan's layout delivers, m³/s, at a test's fall, lift, drive flow (an equal share to each pump) and temperature; null when it cannot say. */
export function predictedDelivery(
  layout: PlanLayout,
  t: Pick<SiteTest, 'fallM' | 'liftM' | 'driveFlowM3s' | 'waterTempC'>,
): number | null {
  try {
    const q = layoutDelivery(
      { ...layout, fallM: t.fallM, liftM: t.liftM, waterTempC: t.waterTempC ?? layout.waterTempC },
      t.driveFlowM3s / layout.pumpCount,
    );
    return q > 0 ? q : null;
  } catch {
    // a test the planner refuses (a lift below the fall, a flow outside its range) has no prediction
    return null;
  }
}

function differences(layout: PlanLayout, t: SiteTest): LayoutDifference[] {
  const out: LayoutDifference[] = [];
  if (t.pumpSize !== layout.pumpSize) out.push('pumpSize');
  if (t.pumpCount !== layout.pumpCount) out.push('pumpCount');
  if (t.driveSize !== layout.driveSize) out.push('driveSize');
  if (t.deliverySize !== null && t.deliverySize !== layout.deliverySize) out.push('deliverySize');
  return out;
}

/**
 * A change in the ratio smaller than this share is read as steady: bucket trials
 * scatter by a few per cent and a stream's fall shifts with its level (common
 * practice, no source).
 */
export const STEADY_WITHIN = 0.15;
/** Steadily below this share of the plan is worth a look even without a trend (common practice, no source). */
export const WELL_BELOW = 0.7;
/** Steadily above this share, the plan is cautious for this pump (common practice, no source). */
export const WELL_ABOVE = 1.3;

export type TrendKind = 'none' | 'one' | 'steady' | 'falling' | 'rising';

export interface Trend {
  kind: TrendKind;
  /** tests with a prediction */
  count: number;
  /** the ratio on the straight line through the tests (least squares over days), at the first and the last test */
  from: number;
  to: number;
  /** mean ratio */
  mean: number;
  days: number;
}

const dayNumber = (d: string) => Date.parse(`${d}T00:00:00Z`) / 86_400_000;

/**
 * The trend of measured ÷ predicted over time: a straight line fitted by least squares
 * through (day, ratio), read at the first and last test. Two tests give the line
 * through both.
 */
export function trendOf(rows: readonly MeasuredTest[]): Trend {
  const pts = rows.filter((r) => r.ratio !== null).map((r) => ({ x: dayNumber(r.testedOn), y: r.ratio as number }));
  const n = pts.length;
  const mean = n ? pts.reduce((s, p) => s + p.y, 0) / n : 0;
  if (n === 0) return { kind: 'none', count: 0, from: 0, to: 0, mean: 0, days: 0 };
  const first = pts[0]!.x;
  const last = pts[n - 1]!.x;
  if (n === 1 || last === first)
    return { kind: n === 1 ? 'one' : 'steady', count: n, from: mean, to: mean, mean, days: 0 };
  const mx = pts.reduce((s, p) => s + p.x, 0) / n;
  const sxx = pts.reduce((s, p) => s + (p.x - mx) ** 2, 0);
  const slope = pts.reduce((s, p) => s + (p.x - mx) * (p.y - mean), 0) / sxx;
  const from = mean + slope * (first - mx);
  const to = mean + slope * (last - mx);
  const change = (to - from) / from;
  const kind = Math.abs(change) < STEADY_WITHIN ? 'steady' : change < 0 ? 'falling' : 'rising';
  return { kind, count: n, from, to, mean, days: last - first };
}

/** A share of the plan as a person says it: to the nearest 5 %. */
export function sharePercent(ratio: number): number {
  return Math.round((ratio * 100) / 5) * 5;
}

/** A span of days in weeks or months, as said at the creek. */
export function spanWords(days: number): string {
  if (days < 14) return `${Math.round(days)} days`;
  if (days < 60) return `${Math.round(days / 7)} weeks`;
  const months = Math.round(days / 30.4);
  return months === 1 ? 'a month' : `${months} months`;
}

/** What the trend says, in a sentence or two a builder would write. */
export function trendSentence(t: Trend): string {
  const pct = (r: number) => `${sharePercent(r)} %`;
  switch (t.kind) {
    case 'none':
      return 'No test here can be set against the plan yet.';
    case 'one':
      return `One test so far, at about ${pct(t.mean)} of what the plan expects for that day’s flow. Another in a few weeks will show whether it holds.`;
    case 'falling':
      return `Delivery has fallen from about ${pct(t.from)} to ${pct(t.to)} of the plan over ${spanWords(t.days)}. A steady fall like this usually means a worn or sticking valve, a blocked intake screen or grit in the drive pipe: look there before changing the stroke.`;
    case 'rising':
      return `Delivery has risen from about ${pct(t.from)} to ${pct(t.to)} of the plan over ${spanWords(t.days)}, as it does after tuning the waste valve or clearing the screen.`;
    case 'steady':
      if (t.mean < WELL_BELOW)
        return `Steady at about ${pct(t.mean)} of the plan. Consistently low points to the setup rather than wear: check the fall and lift as built, the waste valve’s stroke and weight, and the delivery line for leaks.`;
      if (t.mean > WELL_ABOVE)
        return `Steady at about ${pct(t.mean)} of the plan: this pump does better than the typical one the plan assumes.`;
      return `Steady at about ${pct(t.mean)} of the plan across ${t.count} tests: the pump is holding up.`;
  }
}
