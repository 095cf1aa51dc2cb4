/**
 * A saved site as a question's site sheet and as a calculator's starting inputs: what the
 * member surveyed (fall, lift, spare flow) and what the plan chose (pump size and count,
 * drive pipe, delivery line). Pure, like lib/calculators/site-sheet.ts, so the pages and the
 * tests share it.
 */
import { asWritten, unitSystemOf, type QuantityKind, type SitePlanResults, type UnitSystem } from '@/lib/hydraulics';
import { calculatorPropsFromSiteSheet, type SiteSheet } from '@/lib/calculators/site-sheet';
import type { CalculatorId } from '@/lib/calculators/ids';
import { splitTyped } from '@/lib/calculators/state';

/**
 * The parts of a stored plan the links read. Stored as JSON by whichever engine saved it,
 * so each part may be missing from an older version: the sheet then leaves that box empty.
 */
type StoredPlan = {
  survey?: Partial<Pick<SitePlanResults['survey'], 'fallM' | 'liftM' | 'spareFlowM3s'>>;
  pump?: {
    pumps?: { size?: string; count?: number; driveFlowEachM3s?: number } | null;
    upper?: { tankHeightM?: number };
  };
  stages?: {
    drivePipe?: { nominal?: string; series?: string; lengthM?: number };
    deliveryLine?: { nominal?: string; series?: string; lengthM?: number };
  }[];
  deliveredM3PerDay?: number;
};

const num = (x: unknown): x is number => typeof x === 'number' && Number.isFinite(x);

/** An SI value as the asker would type it: their units, rounded as a tape or a bucket gives it. */
function typedSI(kind: QuantityKind, si: number, units: UnitSystem): string {
  const d = asWritten(kind, si, units);
  return `${d.value} ${d.unit}`;
}

/**
 * A survey value as the member typed it when it is already in the asker's units ("4 ft" for
 * a US asker stays "4 ft", not a re-rounded 4.0 ft); otherwise the plan's reading of it in
 * the asker's units.
 */
function typedOr(typed: string | undefined, kind: QuantityKind, si: number | undefined, units: UnitSystem) {
  const unit = typed ? splitTyped(typed).unit : undefined;
  if (typed && unit && unitSystemOf(unit) === units) return typed.trim();
  return num(si) ? typedSI(kind, si, units) : undefined;
}

/**
 * A site's survey and plan as a site sheet, in the asker's units. The sheet describes the
 * pumps on the source: for a staged plan that is the lower stage, whose lift is the stage
 * tank's height (the stall check reads one set of pumps with one fall and one lift). What
 * only a running pump tells (drive flow, delivery, beats, symptoms) is left for the asker.
 */
export function planSiteSheet(
  survey: Record<string, string>,
  plan: Record<string, unknown>,
  units: UnitSystem,
): SiteSheet {
  const p = plan as StoredPlan;
  const s = p.survey ?? {};
  const staged = p.pump?.upper && num(p.pump.upper.tankHeightM) ? p.pump.upper.tankHeightM : undefined;
  const sheet: SiteSheet = {};
  const put = (k: keyof SiteSheet, v: string | undefined) => {
    if (v) sheet[k] = v;
  };
  put('fall', typedOr(survey.fall, 'length', s.fallM, units));
  put('lift', staged !== undefined ? typedSI('length', staged, units) : typedOr(survey.lift, 'length', s.liftM, units));
  put('sourceFlow', typedOr(survey.spareFlow, 'flow', s.spareFlowM3s, units));
  const pumps = p.pump?.pumps;
  if (pumps) {
    put('pumpSize', pumps.size);
    if (num(pumps.count)) put('pumps', String(pumps.count));
  }
  const stage = p.stages?.[0];
  if (stage?.drivePipe) {
    const d = stage.drivePipe;
    if (num(d.lengthM)) put('driveLength', typedSI('length', d.lengthM, units));
    put('driveSize', d.nominal);
    put('driveMaterial', d.series);
  }
  if (stage?.deliveryLine) {
    const l = stage.deliveryLine;
    if (num(l.lengthM)) put('deliveryLength', typedSI('length', l.lengthM, units));
    put('deliverySize', l.nominal);
    put('deliveryMaterial', l.series);
  }
  return sheet;
}

/** The survey's demand boxes, which the demand and storage calculator names the same way. */
const DEMAND_PROPS = [
  'people',
  'perPerson',
  'garden',
  'sheep',
  'goats',
  'beefCattle',
  'dairyCows',
  'horses',
  'pigs',
  'chickens',
  'reserveDays',
];
const PUMP_TYPE_TOOLS: readonly CalculatorId[] = ['stall-check', 'yield-estimate', 'array-planner'];

/**
 * A calculator's starting inputs from a site: the site sheet's prefill, plus what a plan
 * knows and a question's sheet leaves to the asker (the drive flow each pump is tuned to, the
 * pump type), and for demand and storage the survey's demand and the plan's delivery.
 */
export function calculatorPropsFromSite(
  tool: CalculatorId,
  survey: Record<string, string>,
  plan: Record<string, unknown>,
  units: UnitSystem,
): Record<string, string> {
  const p = plan as StoredPlan;
  const sheet: Record<string, string> = { ...planSiteSheet(survey, plan, units) } as Record<string, string>;
  const each = p.pump?.pumps?.driveFlowEachM3s;
  if (num(each)) sheet.driveFlow = typedSI('flow', each, units);
  const props = calculatorPropsFromSiteSheet(tool, sheet);
  if (PUMP_TYPE_TOOLS.includes(tool) && survey.pumpType) props.pumpType = survey.pumpType;
  if (tool === 'demand-and-storage') {
    for (const k of DEMAND_PROPS) if (survey[k]) props[k] = survey[k];
    if (num(p.deliveredM3PerDay) && p.deliveredM3PerDay > 0)
      props.delivery = typedSI('dailyVolume', p.deliveredM3PerDay, units);
  }
  return props;
}
