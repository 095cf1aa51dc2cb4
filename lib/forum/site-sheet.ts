// eslint-disable-next-line no-restricted-imports -- moved by the calculator core
import { calculatorDefs } from '@/components/calculators/defs';
// eslint-disable-next-line no-restricted-imports -- moved by the calculator core
import { readForm, initialState } from '@/components/calculators/kit/state';
// eslint-disable-next-line no-restricted-imports -- moved by the calculator core
import { computeFromForm } from '@/components/calculators/recompute';
import { DEFAULT_UNITS } from '@/lib/units/preference';
import { ForumError } from './errors';

/** The stall check needs at least these to run on a site sheet. */
const NEEDED_FOR_CHECK = ['fall', 'lift', 'driveLength'] as const;

/**
 * Checks a site sheet as typed: each value must read (with its unit), and when the
 * sheet is complete enough the stall check must accept it (lift above the fall,
 * flows positive…). Throws a ForumError naming `siteSheet.<field>`.
 */
export function validateSiteSheet(sheet: Record<string, string | undefined> | undefined): Record<string, string> | null {
  if (!sheet) return null;
  const given = Object.fromEntries(Object.entries(sheet).filter((e): e is [string, string] => typeof e[1] === 'string' && e[1].trim() !== ''));
  if (Object.keys(given).length === 0) return null;
  const def = calculatorDefs['stall-check'];
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
