/**
 * A question's site sheet: the stall check's form as the member typed it ("4 ft"),
 * stored as JSON with the question. One home for all it does: check it on the
 * server, fill it from a field log entry, show it in the reader's units and open
 * any calculator prefilled from it. Pure, so the browser and the server share it.
 */
import {
  defaultSeries,
  NOMINAL_LABELS,
  SYMPTOM_LABELS,
  roundAsWritten,
  toDisplay,
  type NominalSize,
  type PipeMaterial,
  type Symptom,
  type UnitSystem,
} from '@/lib/hydraulics';
import { ForumError } from '@/lib/questions/errors';
import { DEFAULT_UNITS } from '@/lib/units/preference';
import type { SiteSheetField } from '@/lib/validation/question';
import { formatQuantity } from './format';
import type { CalculatorId } from './ids';
import { SERIES_LABELS } from './pipes';
import { computeFromForm } from './from-form';
import { CALCULATORS } from './registry';
import { initialState, readForm } from './state';

export type SiteSheet = Partial<Record<SiteSheetField, string>>;

/** The stall check needs at least these to run on a site sheet. */
const NEEDED_FOR_CHECK = ['fall', 'lift', 'driveLength'] as const;

/**
 * Checks a site sheet as typed: each value must read (with its unit), and when the
 * sheet is complete enough the stall check must accept it (lift above the fall,
 * flows positive…). Throws a ForumError naming `siteSheet.<field>`.
 */
export function validateSiteSheet(
  sheet: Record<string, string | undefined> | undefined,
): Record<string, string> | null {
  if (!sheet) return null;
  const given = Object.fromEntries(
    Object.entries(sheet).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1].trim() !== ''),
  );
  if (Object.keys(given).length === 0) return null;
  const def = CALCULATORS['stall-check'];
  const state = initialState(def.fields, given, {}, DEFAULT_UNITS);
  const fields = def.fields.filter((f) => f.prop in given);
  const { errors } = readForm(fields, state);
  const first = Object.entries(errors)[0];
  if (first) {
    const f = def.fields.find((x) => x.name === first[0])!;
    throw new ForumError(422, `${f.label}: ${first[1]}`, `siteSheet.${f.prop}`);
  }
  if (NEEDED_FOR_CHECK.every((k) => k in given)) {
    const out = computeFromForm('stall-check', given);
    if (!out.ok) throw new ForumError(422, out.message, out.field ? `siteSheet.${out.field}` : 'siteSheet');
  }
  return given;
}

/** What a field log entry measured, in SI, as far as a site sheet needs it. */
export interface MeasuredSite {
  fallM: number;
  liftM: number;
  driveLengthM: number;
  driveSize: string;
  driveMaterial: string;
  pumpSize: string;
  pumpCount: number;
  driveFlowM3s: number;
  deliveredFlowM3s: number;
  beatsPerMinute: number | null;
  deliveryLengthM: number | null;
  deliverySize: string | null;
  deliveryMaterial: string | null;
}

const short = (x: number) => String(Number(x.toPrecision(4)));

/**
 * A field log entry as a question's site sheet, so the ask form can be filled from a measured
 * test; typed in the asker's units (ft and gal/min, or m and L/min), as they would type it.
 */
export function entrySiteSheet(e: MeasuredSite, units: UnitSystem = 'metric'): SiteSheet {
  const typed = (kind: 'length' | 'flow', si: number) => {
    // re-expressed in the asker's units, rounded as a tape or a bucket gives it (7.9 ft, not 7.874 ft)
    const d = toDisplay(kind, si, units);
    return `${short(roundAsWritten(d.value, d.unit, kind))} ${d.unit}`;
  };
  const sheet: SiteSheet = {
    fall: typed('length', e.fallM),
    lift: typed('length', e.liftM),
    driveLength: typed('length', e.driveLengthM),
    driveSize: e.driveSize,
    driveMaterial: defaultSeries(e.driveMaterial as PipeMaterial),
    pumpSize: e.pumpSize,
    pumps: String(e.pumpCount),
    // the site sheet asks for one pump's drive flow
    driveFlow: typed('flow', e.driveFlowM3s / e.pumpCount),
    delivered: typed('flow', e.deliveredFlowM3s),
  };
  if (e.beatsPerMinute !== null) sheet.bpm = String(e.beatsPerMinute);
  if (e.deliveryLengthM !== null) sheet.deliveryLength = typed('length', e.deliveryLengthM);
  if (e.deliverySize) sheet.deliverySize = e.deliverySize;
  if (e.deliveryMaterial) sheet.deliveryMaterial = defaultSeries(e.deliveryMaterial as PipeMaterial);
  return sheet;
}

/** Which calculator input each site-sheet field fills, per calculator (the site sheet is the stall check's form). */
const PREFILL: Record<CalculatorId, Partial<Record<SiteSheetField, string>>> = {
  'stall-check': {
    fall: 'fall',
    lift: 'lift',
    driveLength: 'driveLength',
    driveSize: 'driveSize',
    driveMaterial: 'driveMaterial',
    elbows: 'elbows',
    sourceFlow: 'sourceFlow',
    pumpSize: 'pumpSize',
    pumps: 'pumps',
    driveFlow: 'driveFlow',
    delivered: 'delivered',
    bpm: 'bpm',
    symptoms: 'symptoms',
    deliveryLength: 'deliveryLength',
    deliverySize: 'deliverySize',
    deliveryMaterial: 'deliveryMaterial',
  },
  'yield-estimate': { fall: 'fall', lift: 'lift', driveFlow: 'driveFlow', delivered: 'measured' },
  'drive-pipe-check': {
    fall: 'fall',
    lift: 'lift',
    driveLength: 'length',
    driveSize: 'size',
    driveMaterial: 'material',
    elbows: 'elbows',
    driveFlow: 'driveFlow',
  },
  'delivery-line': {
    lift: 'lift',
    deliveryLength: 'length',
    deliverySize: 'size',
    deliveryMaterial: 'material',
    delivered: 'flow',
  },
  'array-planner': {
    fall: 'fall',
    lift: 'lift',
    pumps: 'pumps',
    driveFlow: 'driveFlowEach',
    driveLength: 'driveLength',
    driveSize: 'driveSize',
    driveMaterial: 'driveMaterial',
    deliveryLength: 'deliveryLength',
    deliverySize: 'deliverySize',
    deliveryMaterial: 'deliveryMaterial',
    sourceFlow: 'sourceFlow',
  },
  'source-flow': {},
  'demand-and-storage': {},
};

/** A calculator's starting inputs from a question's site sheet ("open any calculator prefilled"). */
export function calculatorPropsFromSiteSheet(
  tool: CalculatorId,
  sheet: Record<string, string> | null,
): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [from, to] of Object.entries(PREFILL[tool])) if (to && sheet?.[from]) out[to] = sheet[from];
  return out;
}

/** The site sheet's fields as a reader sees them named. */
export const SITE_SHEET_LABELS: Record<SiteSheetField, string> = {
  fall: 'Fall',
  lift: 'Lift',
  driveLength: 'Drive pipe length',
  driveSize: 'Drive pipe size',
  driveMaterial: 'Drive pipe material',
  elbows: 'Extra elbows on the drive pipe',
  sourceFlow: 'Source can spare',
  pumpSize: 'Pump size',
  pumps: 'Pumps',
  driveFlow: 'Drive flow (one pump)',
  delivered: 'Delivered',
  bpm: 'Beats per minute',
  deliveryLength: 'Delivery line length',
  deliverySize: 'Delivery line size',
  deliveryMaterial: 'Delivery line material',
  symptoms: 'What it does',
};

/**
 * The site sheet for reading, each measurement in the reader's units as a person would write
 * it, whatever units the asker typed. A bare number is read as the server reads it when the
 * question is asked (DEFAULT_UNITS), so every reader sees the same length.
 */
export function siteSheetRows(
  sheet: Record<string, string> | null,
  units: UnitSystem,
): { label: string; value: string }[] {
  if (!sheet) return [];
  const def = CALCULATORS['stall-check'];
  const state = initialState(def.fields, sheet, {}, DEFAULT_UNITS);
  const rows: { label: string; value: string }[] = [];
  for (const [key, raw] of Object.entries(sheet)) {
    if (!raw) continue;
    const field = def.fields.find((f) => f.prop === key);
    let value = raw;
    if (field?.type === 'quantity') {
      const { values } = readForm([field], state);
      const si = field.name
        .split('.')
        .reduce<unknown>((o, k) => (o as Record<string, unknown> | undefined)?.[k], values);
      if (typeof si === 'number') value = formatQuantity(field.qty, si, units);
    } else if (key === 'driveSize' || key === 'pumpSize' || key === 'deliverySize') {
      value = NOMINAL_LABELS[raw as NominalSize] ?? raw;
    } else if (key === 'driveMaterial' || key === 'deliveryMaterial') {
      value = SERIES_LABELS[raw as keyof typeof SERIES_LABELS] ?? raw;
    } else if (key === 'symptoms') {
      value = raw
        .split(',')
        .map((s) => SYMPTOM_LABELS[s.trim() as Symptom] ?? s)
        .join(', ');
    }
    rows.push({ label: SITE_SHEET_LABELS[key as SiteSheetField] ?? key, value });
  }
  return rows;
}
