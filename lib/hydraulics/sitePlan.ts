/**
 * Site plan: from a survey to a verdict, a design and a parts list. It
 * chains the calculators (demand and storage, pump choice, drive pipe check,
 * delivery line, array planner) and adds only what none of them gives
 * (siteDesign.ts); its working is theirs, each step titled with its part.
 */
import * as z from 'zod/mini';
import { arrayPlannerSchema, planArray, type ArrayPlannerResults } from './arrayPlanner';
import { planDemandAndStorage, type DemandAndStorageResults } from './demandAndStorage';
import { choosePump, type PumpChoiceResults } from './pumpChoice';
import { parseInput } from './schemaKit';
import {
  AIR_CHAMBER_RULE,
  SNIFTER_HOLE,
  airChamberVolume,
  designDeliveryLine,
  designDrivePipe,
  designSupply,
  type DeliveryDesign,
  type DrivePipeDesign,
  type SupplyDesign,
} from './siteDesign';
import { finish, type CalcOutput, type Step, type Warning } from './steps';
import { monthlyDelivery, siteCautions, verdictFor, type MonthlyDelivery, type Verdict } from './siteVerdict';
import { buildPartsList, type PartsListItem } from './partsList';
import { sitePlanSchema, type SitePlanInput, type SitePlanSurvey } from './siteSurvey';
import { airChamberStep, pumpChoiceSteps, supplySteps } from './siteSteps';

export interface StageDesign {
  stage: 'source' | 'upper';
  drivePipe: DrivePipeDesign['check']['results'] & {
    nominal: DrivePipeDesign['nominal'];
    series: DrivePipeDesign['series'];
    lengthM: number;
    pathM: number;
  };
  deliveryLine: {
    nominal: DeliveryDesign['nominal'];
    series: DeliveryDesign['series'];
    lengthM: number;
    lossM: number;
    pressureRatingPa: number;
    pumpPressurePa: number;
  };
  airChamberM3: number;
}

export interface SitePlanResults {
  /** the survey as read, defaults filled: what a saved site keeps */
  survey: SitePlanSurvey;
  verdict: Verdict;
  demandM3PerDay: number;
  /** what the design delivers each day at the top */
  deliveredM3PerDay: number;
  pump: PumpChoiceResults;
  stages: StageDesign[];
  supply: SupplyDesign | null;
  airChamberRule: string;
  snifterHoleM: number;
  snifterSource: string;
  fittingsToAvoid: string[];
  storage: DemandAndStorageResults | null;
  array: ArrayPlannerResults | null;
  monthly: MonthlyDelivery | null;
  parts: PartsListItem[];
}

const FITTINGS_TO_AVOID = [
  'elbows, bends and tees anywhere in the drive pipe: lay it straight',
  'reducers in the drive pipe: one bore from intake to pump',
  'a valve in the drive pipe left part-closed: the isolating valve runs fully open',
  'hose or polyethylene for the drive pipe: it soaks up the beat',
  'threaded joints in schedule 40 PVC at the pump',
];

const titled = (part: string, steps: Step[]) => steps.map((s) => ({ ...s, title: `${part}: ${s.title}` }));

/**
 * Plans a site from its survey.
 *
 * Formulas: as the calculators it chains: demand (planDemandAndStorage), pump size and arrangement
 * (choosePump), drive pipe length 5–10 × fall and its surge (designDrivePipe → checkDrivePipe), the
 * delivery line within the accepted loss (designDeliveryLine → checkDeliveryLine), delivery with both
 * lines' losses (planArray), storage for the reserve days, the supply and screen (designSupply).
 * Units: SI. Range: as the schema.
 * Reference: the calculators' own; verdict rules siteVerdict.ts.
 * @example the smallholding's brook: 4 ft fall, 10 US gal/min spare, 29 ft lift, one person
 * const demand = { people: 1, perPersonM3PerDay: 0.1 }
 * const r = planSite({ fallM: 1.2192, spareFlowM3s: toSI(10, 'gal/min', 'flow'), liftM: 8.8392, sourceToPumpRunM: 9, pumpToTankRunM: 60, demand }).results
 * r.pump.arrangement  // → 'single'
 * r.demandM3PerDay  // ≈ 0.1
 * r.verdict.verdict  // → 'works'
 */
export function planSite(input: SitePlanInput): CalcOutput<SitePlanResults> {
  const v = parseInput(sitePlanSchema, input);
  const steps: Step[] = [];
  const warnings: Warning[] = [];
  const demandOnly = planDemandAndStorage({
    deliveredFlowM3s: v.spareFlowM3s,
    ...v.demand,
    reserveDays: v.reserveDays,
  });
  const demand = demandOnly.results.totalDemandM3PerDay;
  steps.push(
    ...titled(
      'Demand',
      demandOnly.steps.filter((s) => !/^Delivered|^Surplus|^Time|^Tank/.test(s.title)),
    ),
  );

  const pump = choosePump({
    fallM: v.fallM,
    liftM: v.liftM,
    spareFlowM3s: v.spareFlowM3s,
    demandM3PerDay: demand,
    pumpType: v.pumpType,
    deliveryLossShare: v.deliveryLossShare,
    maxPumps: v.maxPumps,
    largestSize: v.largestSize,
  });
  steps.push(...pumpChoiceSteps(pump, demand, v.liftM, v.deliveryLossShare));
  const stages: StageDesign[] = [];
  let supply: SupplyDesign | null = null;
  let array: ArrayPlannerResults | null = null;
  let storage: DemandAndStorageResults | null = null;
  let delivered = 0;
  const lower = pump.pumps;

  if (lower) {
    const staged = pump.upper;
    // the lower stage lifts to the stage tank, partway up the run in proportion to its height
    const lowerLift = staged ? staged.tankHeightM : v.liftM;
    const lowerRun = staged ? (v.pumpToTankRunM * staged.tankHeightM) / v.liftM : v.pumpToTankRunM;
    const drive = designDrivePipe(v.fallM, v.sourceToPumpRunM, lower.size, lowerLift, lower.driveFlowEachM3s);
    const line = designDeliveryLine(
      lower.deliveredM3PerDay / 86400,
      lowerLift,
      lowerRun,
      v.deliveryLossShare,
      v.freezes,
    );
    supply = designSupply(lower.totalDriveFlowM3s, v.fallM, drive.supplyLengthM);
    const stage = (which: StageDesign['stage'], d: DrivePipeDesign, l: DeliveryDesign): StageDesign => ({
      stage: which,
      drivePipe: { ...d.check.results, nominal: d.nominal, series: d.series, lengthM: d.lengthM, pathM: d.pathM },
      deliveryLine: {
        nominal: l.nominal,
        series: l.series,
        lengthM: l.lengthM,
        lossM: l.check.results.frictionHeadM + l.check.results.minorHeadM,
        pressureRatingPa: l.spec.pressureRatingPa,
        pumpPressurePa: l.check.results.pumpPressurePa,
      },
      airChamberM3: airChamberVolume(l.spec.insideDiameterM, l.lengthM),
    });
    stages.push(stage('source', drive, line));
    steps.push(
      ...supplySteps(v.fallM, v.sourceToPumpRunM, drive.lengthM, lower.totalDriveFlowM3s),
      airChamberStep(line.spec.insideDiameterM, line.lengthM, AIR_CHAMBER_RULE.source),
    );
    const part = staged ? 'Lower stage' : 'Pumps';
    steps.push(
      ...titled(`${part} drive pipe`, drive.check.steps),
      ...titled(`${part} delivery line`, line.check.steps),
    );
    warnings.push(...drive.check.warnings, ...line.check.warnings);
    const pipeOf = (d: DrivePipeDesign) => ({
      lengthM: d.lengthM,
      insideDiameterM: d.spec.insideDiameterM,
      wallThicknessM: d.spec.wallThicknessM,
      pressureRatingPa: d.spec.pressureRatingPa,
      material: d.spec.material,
    });
    const lineOf = (l: DeliveryDesign) => ({
      lengthM: l.lengthM,
      insideDiameterM: l.spec.insideDiameterM,
      pressureRatingPa: l.spec.pressureRatingPa,
      material: l.spec.material,
    });
    const arrayInput: z.input<typeof arrayPlannerSchema> = {
      fallM: v.fallM,
      liftM: lowerLift,
      pumps: Array.from({ length: lower.count }, (_, i) => ({
        label: `pump ${i + 1}`,
        pumpType: v.pumpType,
        driveFlowM3s: lower.driveFlowEachM3s,
        drivePipe: pipeOf(drive),
      })),
      deliveryLine: lineOf(line),
      sourceSpareFlowM3s: v.spareFlowM3s,
      waterTempC: v.waterTempC,
    };
    if (staged) {
      const upperRun = (v.pumpToTankRunM * staged.tankHeightM) / v.liftM;
      const upDrive = designDrivePipe(staged.fallM, upperRun, staged.size, v.liftM, staged.driveFlowEachM3s);
      const upLine = designDeliveryLine(
        staged.deliveredM3PerDay / 86400,
        v.liftM,
        v.pumpToTankRunM,
        v.deliveryLossShare,
        v.freezes,
      );
      stages.push(stage('upper', upDrive, upLine));
      steps.push({
        ...airChamberStep(upLine.spec.insideDiameterM, upLine.lengthM, AIR_CHAMBER_RULE.source),
        title: 'Upper stage air chamber: as large as its delivery line holds',
      });
      steps.push(
        ...titled('Upper stage drive pipe', upDrive.check.steps),
        ...titled('Upper stage delivery line', upLine.check.steps),
      );
      warnings.push(...upDrive.check.warnings, ...upLine.check.warnings);
      arrayInput.staged = {
        upperFallM: staged.fallM,
        upperLiftM: v.liftM,
        upperPump: {
          label: 'upper pump',
          pumpType: v.pumpType,
          driveFlowM3s: staged.driveFlowEachM3s,
          drivePipe: pipeOf(upDrive),
        },
        upperDeliveryLine: lineOf(upLine),
      };
    }
    const planned = planArray(arrayInput);
    array = planned.results;
    steps.push(...titled('Delivery', planned.steps));
    warnings.push(...planned.warnings);
    delivered = staged ? (array.staged?.topYieldPerDayM3PerDay ?? 0) : array.combinedPerDayM3PerDay;
    if (delivered > 0) {
      const st = planDemandAndStorage({ deliveredFlowM3s: delivered / 86400, ...v.demand, reserveDays: v.reserveDays });
      storage = st.results;
      steps.push(
        ...titled(
          'Storage',
          st.steps.filter((s) => !/^Household|^Garden|^Livestock|^Total demand/.test(s.title)),
        ),
      );
      warnings.push(...st.warnings);
    }
  }

  const verdict = verdictFor(v, pump, demand, delivered);
  warnings.push(...siteCautions(v, stages, supply, array));
  // the plan sizes lines by Darcy-Weisbach, so the Hazen-Williams aside would only be noise here;
  // and the survey's flow is already what the source can spare, so the share of it the pumps
  // take is no caution (taking more than it is: drive-exceeds-source stays)
  const seen = new Set<string>(['hazen-williams-outside-range', 'drive-near-source-limit']);
  const unique = warnings.filter((w) =>
    seen.has(w.code) || seen.has(w.code + w.message) ? false : (seen.add(w.code + w.message), true),
  );
  const monthly = v.wetFlowM3s !== undefined && array ? monthlyDelivery(v, pump, delivered, demand) : null;
  const results: SitePlanResults = {
    survey: v,
    verdict,
    demandM3PerDay: demand,
    deliveredM3PerDay: delivered,
    pump,
    stages,
    supply,
    airChamberRule: AIR_CHAMBER_RULE.source,
    snifterHoleM: SNIFTER_HOLE.diameterM,
    snifterSource: SNIFTER_HOLE.source,
    fittingsToAvoid: FITTINGS_TO_AVOID,
    storage,
    array,
    monthly,
    parts: buildPartsList({ survey: v, pump, stages, supply, storage }),
  };
  return finish(results, steps, unique);
}
