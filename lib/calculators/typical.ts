import type { UnitSystem } from '@/lib/hydraulics';
import { formatNumber } from './format';
import { computeForm } from './recompute';
import type { CalculatorDef, FormState } from './types';

export interface TypicalEfficiency {
  /** the form's efficiency field (the one typed as a percentage) */
  field: string;
  typical: number;
  low: number;
  high: number;
}

/**
 * The efficiency the engine would use at the site the form describes, with its band: what
 * an empty efficiency field stands for. Worked out with the field emptied, so the reader who
 * typed a figure still sees the typical one and the band beside it. Null when the calculator
 * has no such field or the rest of the form does not compute yet.
 */
export function typicalEfficiency<R>(
  def: CalculatorDef<R>,
  state: FormState,
  units?: UnitSystem,
): TypicalEfficiency | null {
  const field = def.fields.find((f) => f.type === 'number' && f.percent);
  if (!field || !def.efficiencyBand) return null;
  const emptied: FormState = { ...state, [field.name]: { ...state[field.name], text: '' } };
  const out = computeForm(def, emptied, units);
  if (!out.ok) return null;
  const band = def.efficiencyBand(out.output.results);
  return band ? { field: field.name, ...band } : null;
}

/**
 * "27.7 %": an efficiency as the results write the efficiency used (three figures), so the
 * box and the result row show the same number; `whole` for a band's ends, as the band row does.
 */
export function percentWords(x: number, whole = false): string {
  return `${whole ? Math.round(x * 100) : formatNumber(x * 100)} %`;
}
