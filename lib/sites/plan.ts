import 'server-only';
import { recompute, type Recomputed } from '@/lib/calculators/recompute';
import { sitePlanner } from '@/lib/calculators/defs/sitePlan';
import type { SitePlanResults, UnitSystem } from '@/lib/hydraulics';
import { keepToolFields } from '@/lib/calculations/store';

/**
 * The plan of a survey as the server makes it: only the planner's own inputs kept, the
 * engine run on them exactly as the page does. What a browser says the plan was is never
 * stored.
 */
export function planFromSurvey(
  survey: Record<string, string>,
  units: UnitSystem,
): { form: Record<string, string>; planned: Recomputed<SitePlanResults> } {
  const form = keepToolFields(
    survey,
    sitePlanner.fields.map((f) => f.prop),
  );
  return { form, planned: recompute(sitePlanner, form, units) };
}
