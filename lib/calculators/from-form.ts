/**
 * Kept apart from recompute.ts, which the browser's calculator card uses: only this look-up
 * by id needs the registry of every calculator, and a card on a guide ships its own definition alone.
 */
import type { UnitSystem } from '@/lib/hydraulics';
import { recompute, type Recomputed } from './recompute';
import { getCalculator } from './registry';

/** {@link recompute} by the calculator's id, as stored or sent (an unknown id is refused naming `tool`). */
export function computeFromForm(tool: string, form: Record<string, string>, units?: UnitSystem): Recomputed {
  const def = getCalculator(tool);
  if (!def) return { ok: false, field: 'tool', message: `no calculator called ${tool}` };
  return recompute(def, form, units);
}
