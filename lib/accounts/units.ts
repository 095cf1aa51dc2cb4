import 'server-only';
import { initModels } from '@/models';
import type { UnitPreference } from '@/lib/units/preference';

/**
 * Saves a member's unit system, the one preference the header's switch and the
 * settings page share. One column of one row: no transaction needed. False when the
 * account is gone.
 */
export async function saveUnits(userId: number, units: UnitPreference): Promise<boolean> {
  const [changed] = await initModels().User.update({ units }, { where: { id: userId } });
  if (changed > 0) return true;
  // MariaDB counts a row set to the value it already had as unchanged: it still exists
  return (await initModels().User.count({ where: { id: userId } })) > 0;
}
