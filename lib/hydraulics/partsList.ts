/**
 * The parts list of a site plan: every pipe length, fitting, valve, gauge,
 * union and tank, with quantities and sizes as data (SI and nominal sizes),
 * so the page shows it in the reader's units and writes it as CSV.
 */
import type { DemandAndStorageResults } from './demandAndStorage';
import { NOMINAL_SIZES, type NominalSize, type PipeSeries } from './pipes';
import type { PumpChoiceResults, PumpSet } from './pumpChoice';
import { SCREEN_APPROACH_VELOCITY, SNIFTER_HOLE, type SupplyDesign } from './siteDesign';
import type { StageDesign } from './sitePlan';
import type { SitePlanSurvey } from './siteSurvey';
import { pumpSideRating } from './siteVerdict';

export const PART_KINDS = ['pipe', 'fitting', 'valve', 'gauge', 'union', 'tank', 'screen', 'vessel'] as const;
export type PartKind = (typeof PART_KINDS)[number];

export const PART_GROUPS = ['intake', 'supply', 'drive', 'pump', 'delivery', 'storage'] as const;
export type PartGroup = (typeof PART_GROUPS)[number];

/** Extra pipe bought over the measured length for cuts, joints and a spare (common practice, no source). */
export const PIPE_ALLOWANCE = {
  share: 0.1,
  source: 'common practice, no published source found: a tenth extra',
} as const;

/** Hours of the upper pumps' drive flow the stage tank holds (common practice, no source). */
export const STAGE_TANK_HOURS = 1;

export interface PartsListItem {
  group: PartGroup;
  kind: PartKind;
  /** what it is, in words */
  name: string;
  quantity: number;
  nominal?: NominalSize;
  series?: PipeSeries;
  /** pipe: length of each run to buy, allowance included, m */
  lengthM?: number;
  /** tank or vessel, m³ */
  volumeM3?: number;
  /** screen: open area, m² */
  areaM2?: number;
  /** gauge: the least full-scale reading; relief valve: set below this, Pa */
  pressurePa?: number;
  /** hole or orifice, m */
  diameterM?: number;
  note?: string;
}

const buy = (m: number) => m * (1 + PIPE_ALLOWANCE.share);

/** The next nominal size up (for the overflow, which must carry more than the delivery line brings). */
function sizeUp(n: NominalSize): NominalSize {
  return NOMINAL_SIZES[Math.min(NOMINAL_SIZES.length - 1, NOMINAL_SIZES.indexOf(n) + 1)] ?? n;
}

function pumpParts(stage: StageDesign, set: PumpSet, label: string): PartsListItem[] {
  const n = set.count;
  const s = set.size;
  const d = stage.deliveryLine.nominal;
  const dp = stage.drivePipe;
  return [
    {
      group: 'drive',
      kind: 'pipe',
      name: `${label} drive pipe, laid straight`,
      quantity: n,
      nominal: s,
      series: dp.series,
      lengthM: buy(dp.lengthM),
      note: PIPE_ALLOWANCE.source,
    },
    {
      group: 'drive',
      kind: 'valve',
      name: `${label} isolating valve at the drive pipe's foot (full bore, run fully open)`,
      quantity: n,
      nominal: s,
    },
    { group: 'pump', kind: 'union', name: `${label} union, drive pipe to pump`, quantity: n, nominal: s },
    { group: 'pump', kind: 'fitting', name: `${label} tee, pump body and chamber branch`, quantity: 2 * n, nominal: s },
    { group: 'pump', kind: 'valve', name: `${label} waste valve (swing check, weighted)`, quantity: n, nominal: s },
    { group: 'pump', kind: 'valve', name: `${label} delivery (check) valve`, quantity: n, nominal: s },
    {
      group: 'pump',
      kind: 'vessel',
      name: `${label} air chamber, pressure-rated (never glass)`,
      quantity: n,
      volumeM3: stage.airChamberM3,
      pressurePa: dp.shutOffPressurePa,
      note: 'volume of the delivery line; rated above the shut-off pressure',
    },
    {
      group: 'pump',
      kind: 'fitting',
      name: `${label} snifter hole just below the delivery valve`,
      quantity: n,
      diameterM: SNIFTER_HOLE.diameterM,
      note: SNIFTER_HOLE.source,
    },
    { group: 'pump', kind: 'valve', name: `${label} bleed valve on the air chamber`, quantity: n },
    {
      group: 'pump',
      kind: 'gauge',
      name: `${label} pressure gauge, pump side`,
      quantity: n,
      pressurePa: dp.shutOffPressurePa,
      note: 'full scale at least the shut-off pressure',
    },
    {
      group: 'pump',
      kind: 'valve',
      name: `${label} relief valve`,
      quantity: n,
      pressurePa: pumpSideRating(stage),
      note: 'set above the working pressure and below this, the lowest rating on the pump side (delivery line included)',
    },
    { group: 'delivery', kind: 'valve', name: `${label} delivery isolating valve`, quantity: n, nominal: d },
    { group: 'delivery', kind: 'union', name: `${label} union, pump to delivery line`, quantity: n, nominal: d },
    {
      group: 'delivery',
      kind: 'pipe',
      name: `${label} delivery line`,
      quantity: 1,
      nominal: d,
      series: stage.deliveryLine.series,
      lengthM: buy(stage.deliveryLine.lengthM),
      pressurePa: stage.deliveryLine.pressureRatingPa,
      note: PIPE_ALLOWANCE.source,
    },
  ];
}

/**
 * The parts list for a planned site. Pipe lengths carry PIPE_ALLOWANCE (10 %, common practice).
 * Units: SI; sizes nominal.
 * @example no pumps, no parts
 * buildPartsList({ survey: {}, pump: { pumps: null }, stages: [], supply: null, storage: null })  // → []
 */
export function buildPartsList(plan: {
  survey: Pick<SitePlanSurvey, 'reserveDays'>;
  pump: Pick<PumpChoiceResults, 'pumps' | 'upper'>;
  stages: readonly StageDesign[];
  supply: SupplyDesign | null;
  storage: DemandAndStorageResults | null;
}): PartsListItem[] {
  const { pump, stages, supply, storage } = plan;
  const lower = stages[0];
  if (!pump.pumps || !lower) return [];
  const items: PartsListItem[] = [];
  if (supply) {
    items.push({
      group: 'intake',
      kind: 'screen',
      name: 'intake screen (open area)',
      quantity: 1,
      areaM2: supply.screenOpenAreaM2,
      note: SCREEN_APPROACH_VELOCITY.source,
    });
    if (supply.supplyPipe) {
      items.push(
        {
          group: 'supply',
          kind: 'pipe',
          name: 'supply pipe, intake to standpipe',
          quantity: 1,
          nominal: supply.supplyPipe.nominal,
          series: supply.supplyPipe.series,
          lengthM: buy(supply.supplyPipe.lengthM),
          note: PIPE_ALLOWANCE.source,
        },
        { group: 'supply', kind: 'tank', name: 'standpipe or supply tank, open to the air', quantity: 1 },
      );
    }
  }
  const upperStage = stages[1];
  items.push(...pumpParts(lower, pump.pumps, pump.upper ? 'lower stage:' : 'pump:'));
  if (pump.upper && upperStage) {
    items.push({
      group: 'storage',
      kind: 'tank',
      name: 'stage tank, feeding the upper pump, with an overflow',
      quantity: 1,
      volumeM3: pump.upper.totalDriveFlowM3s * 3600 * STAGE_TANK_HOURS,
      note: `${STAGE_TANK_HOURS} hour of the upper drive flow (common practice, no source)`,
    });
    items.push(...pumpParts(upperStage, pump.upper, 'upper stage:'));
  }
  const top = upperStage ?? lower;
  if (storage && storage.reserveTankM3 > 0)
    items.push({
      group: 'storage',
      kind: 'tank',
      name: `storage tank for ${plan.survey.reserveDays} days`,
      quantity: 1,
      volumeM3: storage.reserveTankM3,
    });
  items.push(
    {
      group: 'storage',
      kind: 'pipe',
      name: 'tank overflow back to the stream',
      quantity: 1,
      nominal: sizeUp(top.deliveryLine.nominal),
      note: 'one size above the delivery line; length as the ground needs',
    },
    {
      group: 'storage',
      kind: 'valve',
      name: "float valve on the tank's outlet to the house or troughs (never on the ram's delivery line)",
      quantity: 1,
    },
  );
  return items;
}
