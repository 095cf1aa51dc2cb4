/**
 * Clackwater's hydraulics engine: every calculation the ram-pump job needs,
 * in SI units, with worked steps and warnings. Framework-free.
 *
 * The public API, listed by name: what the app, the views, lib/ and the tests
 * use. Anything else in this folder is a building block of the calculators;
 * import it from its module only inside the engine.
 */

// What every calculator returns, and the error a bad input throws.
export { ENGINE_VERSION } from './version';
export { EngineInputError, type FieldIssue } from './errors';
export {
  partsTex,
  siTex,
  texNum,
  type CalcOutput,
  type Step,
  type StepPart,
  type StepValue,
  type Warning,
} from './steps';
export { WARNING_CODES } from './warnings';
export { metricText, qty, renderMessage, said, say, type MessagePart, type MessageQuantity } from './message';

// Units at the edges: what people type → SI, SI → the reader's units.
export {
  DISPLAY_UNITS,
  UNIT_CHOICES,
  asWritten,
  fieldFromDisplay,
  fieldToDisplay,
  fromDisplay,
  fromSI,
  inputUnit,
  kindOfField,
  parseQuantity,
  readableDisplay,
  roundAsWritten,
  toDisplay,
  toSI,
  unitLabel,
  unitSystemOf,
  type QuantityKind,
  type UnitSystem,
} from './units';

// Water, pipes and fittings: property tables and schedule sizes.
export { G, waterProperties } from './water';
export {
  NOMINAL_LABELS,
  NOMINAL_SIZES,
  PIPE_SERIES,
  defaultSeries,
  parseNominalSize,
  resolvePipe,
  type NominalSize,
  type PipeMaterial,
  type PipeSeries,
} from './pipes';
export {
  METRIC_ODS_MM,
  METRIC_PIPE_SOURCES,
  METRIC_SERIES,
  defaultSeriesFor,
  nominalPressureBar,
  resolveMetricPipe,
  type MetricOd,
  type MetricPipeSpec,
  type MetricSeries,
} from './metricPipes';
export { FITTING_K, sumK, type FittingKind } from './fittings';
export {
  PE_HDS_PSI,
  VINSON,
  hoopStress,
  jointRating,
  peRating,
  pvcCyclesToFailure,
  pvcFatigue,
  type JointRating,
  type PeGrade,
  type PvcFatigue,
} from './pipeRatings';

// Formulas the calculators are built from, checked on their own by the tests.
export { colebrook, darcyHeadLoss, frictionFactor, hazenWilliamsHeadLoss, swameeJain } from './friction';
export { joukowskyHead, joukowskySurge, slowClosureSurge, waveRoundTrip, waveSpeed } from './transients';
export {
  EFFICIENCY_BANDS,
  EFFICIENCY_SOURCES,
  dAubuissonEfficiency,
  efficiencyBand,
  maxLiftRatio,
  rankineEfficiency,
  type BandAtRatio,
  type EfficiencySource,
  type PumpType,
} from './efficiency';
export { estimateShutOffPressure, shutOffPressure, shutOffSchema, type ShutOffResults } from './shutOff';
export { RAM_CYCLE_SOURCES, estimateDriveFlow } from './ramCycle';
export { PRACTICE, fallRarelyViable, type PracticeRule } from './practice';
export { PUMP_SIZE_SOURCE, typicalDriveFlow } from './pumpSizes';
export { vNotch90Usbr, vNotchFlow, weirCoefficients } from './weirs';
export { GARDEN_DEPTH_PER_WEEK_M, householdRate, livestockRates, type LivestockKind } from './demandRates';

// The seven calculators: input schema, run function and results.
export { estimateYield, yieldEstimateSchema, type YieldEstimateResults } from './yieldEstimate';
export { ARRAY_LIMITS, planArray, arrayPlannerSchema, type ArrayPlannerResults } from './arrayPlanner';
export {
  BEATS_PER_MINUTE_RANGE,
  DEFAULT_BEATS_PER_MINUTE,
  DRIVE_PIPE_GUIDES,
  FATIGUE_DESIGN_LIFE_YEARS,
  RATING_MARGIN,
  checkDrivePipe,
  drivePipeCheckSchema,
  type DrivePipeCheckResults,
} from './drivePipeCheck';
export { checkDeliveryLine, deliveryLineSchema, type DeliveryLineResults } from './deliveryLine';
export {
  BEAT_COUNT_SECONDS,
  BEAT_GAP_RANGE,
  CLOSURE_TOLERANCE_M,
  beatsPerMinute,
  levelSurvey,
  type BeatsResult,
  type LevelSurveyResult,
} from './fieldKit';
export { measureSourceFlow, sourceFlowSchema, type SourceFlowResults } from './sourceFlow';
export { planDemandAndStorage, demandAndStorageSchema, type DemandAndStorageResults } from './demandAndStorage';
export { runStallCheck, stallCheckSchema, type StallCheckInput, type StallCheckResults } from './stallCheck';
export { STALL_CAUSE_CODES, SYMPTOMS, SYMPTOM_LABELS, type StallCauseCode, type Symptom } from './stallCauses';

// The site plan: from a survey to a verdict, a design and a parts list, chaining the calculators.
export {
  DESIGN_MARGIN,
  choosePump,
  pumpChoiceSchema,
  type PumpChoiceInput,
  type PumpChoiceResults,
  type PumpSet,
} from './pumpChoice';
export { planSite, type SitePlanResults, type StageDesign } from './sitePlan';
export { FALL_METHODS, sitePlanSchema, type SitePlanInput, type SitePlanSurvey } from './siteSurvey';
export {
  AIR_CHAMBER_RULE,
  SCREEN_APPROACH_VELOCITY,
  SNIFTER_HOLE,
  SUPPLY_LOSS_SHARE,
  airChamberVolume,
  monthlyFlows,
} from './siteDesign';
export {
  MONTHLY_METHOD,
  VERDICTS,
  WONT_WORK_SHARE,
  type MonthlyDelivery,
  type Verdict,
  type VerdictWord,
} from './siteVerdict';
export {
  PART_GROUPS,
  PART_KINDS,
  PIPE_ALLOWANCE,
  buildPartsList,
  type PartGroup,
  type PartKind,
  type PartsListItem,
} from './partsList';
