/**
 * "Show the working" in the reader's units: each number a step puts into its rule, and its
 * answer, as a person would write them (unit chosen by size, three significant figures, no
 * e-notation). The engine keeps the values in SI with their kinds; this is where they meet
 * the reader.
 */
import {
  fromSI,
  partsTex,
  readableDisplay,
  unitLabel,
  type QuantityKind,
  type Step,
  type StepValue,
  type UnitSystem,
} from '@/lib/hydraulics';
import { formatNumber, formatQuantity } from './format';

/** A unit label in TeX: "US gal/h" → \mathrm{US\ gal/h}, "m³" → \mathrm{m^{3}}. */
export function texUnitLabel(label: string): string {
  if (!label) return '';
  const u = label
    .replace(/³/g, '^{3}')
    .replace(/²/g, '^{2}')
    .replace(/°/g, '^{\\circ}')
    .replace(/·/g, '\\cdot ')
    .replace(/ /g, '\\ ');
  return `\\,\\mathrm{${u}}`;
}

/** A number as formatNumber writes it, in TeX (a thousands comma must not become a list comma). */
export function texNumber(x: number): string {
  return formatNumber(x).replace(/,/g, '{,}');
}

/**
 * Units bound to no kind (a rule's constants and material properties), written in each
 * system's own unit and a readable size. Factors are exact from the foot (0.3048 m) and
 * the pound (0.45359237 kg) of NIST SP 811; a centistoke is a mm²/s.
 */
const FIXED_READABLE: Record<string, Record<UnitSystem, { factor: number; label: string }>> = {
  // water's kinematic viscosity is about one of these at room temperature (common practice, no source)
  'm²/s': { US: { factor: 1e6, label: 'cSt' }, metric: { factor: 1e6, label: 'mm²/s' } },
  'kg/m³': {
    US: { factor: 0.3048 ** 3 / 0.45359237, label: 'lb/ft³' },
    metric: { factor: 1, label: 'kg/m³' },
  },
  'm/s²': { US: { factor: 1 / 0.3048, label: 'ft/s²' }, metric: { factor: 1, label: 'm/s²' } },
};

/** The unit each kind is written in within one step: a sum reads "29 ft + 0.03 ft", not "29 ft + 0.36 in". */
type StepUnits = Partial<Record<QuantityKind, string>>;

/** For each kind in a step's numbers, the unit a person would write the largest of them in. */
function stepUnits(step: Step, units: UnitSystem): StepUnits {
  const largest: Partial<Record<QuantityKind, number>> = {};
  for (const p of step.substituted) {
    if (typeof p === 'string' || !p.kind || p.kind === 'dimensionless') continue;
    const seen = largest[p.kind];
    if (seen === undefined || Math.abs(p.value) > Math.abs(seen)) largest[p.kind] = p.value;
  }
  const out: StepUnits = {};
  for (const [kind, si] of Object.entries(largest) as [QuantityKind, number][])
    out[kind] = readableDisplay(kind, si, units).unit;
  return out;
}

/** One value of a step, shown: { number, unit label } in the reader's units where it has a kind. */
export function stepValueDisplay(
  v: StepValue,
  units: UnitSystem,
  inStep?: StepUnits,
): { value: number; label: string } {
  if (v.kind && v.kind !== 'dimensionless') {
    const unit = inStep?.[v.kind];
    if (unit) return { value: fromSI(v.value, unit, v.kind), label: unitLabel(unit) };
    const d = readableDisplay(v.kind, v.value, units);
    return { value: d.value, label: d.label };
  }
  const fixed = FIXED_READABLE[v.unit]?.[units];
  if (fixed) return { value: v.value * fixed.factor, label: fixed.label };
  return { value: v.value, label: v.unit };
}

/** A value in TeX in the reader's units. */
export function stepValueTex(v: StepValue, units: UnitSystem, inStep?: StepUnits): string {
  const d = stepValueDisplay(v, units, inStep);
  return `${texNumber(d.value)}${texUnitLabel(d.label)}`;
}

/** The substituted formula of a step in TeX, every number in the reader's units (one unit per kind). */
export function substitutedTex(step: Step, units: UnitSystem): string {
  const s = inSystem(step, units);
  const inStep = stepUnits(s, units);
  return partsTex(s.substituted, (v) => stepValueTex(v, units, inStep));
}

/** The step as the reader's system writes its rule, where the engine gives it a form of its own. */
function inSystem(step: Step, units: UnitSystem): Step {
  const own = step.inSystem?.[units];
  return own ? { ...step, ...own, note: own.note ?? step.note } : step;
}

/** A step's answer as plain text in the reader's units, e.g. "30 US gal/h" or "7.25". */
export function stepAnswer(step: Step, units: UnitSystem): string {
  const r = step.result;
  if (r.kind && r.kind !== 'dimensionless') return formatQuantity(r.kind, r.value, units);
  const d = stepValueDisplay(r, units);
  return d.label ? `${formatNumber(d.value)} ${d.label}` : formatNumber(d.value);
}

/** A step ready to draw: its rule, the numbers put in and the answer, all in the reader's units. */
export interface WorkingLine {
  title: string;
  formula: string;
  substituted: string;
  answer: string;
  note?: string;
}

export function workingLines(steps: readonly Step[], units: UnitSystem): WorkingLine[] {
  return steps.map((step) => {
    const s = inSystem(step, units);
    return {
      title: s.title,
      formula: s.formula,
      substituted: substitutedTex(s, units),
      answer: stepAnswer(s, units),
      ...(s.note ? { note: s.note } : {}),
    };
  });
}
