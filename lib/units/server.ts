import { cookies } from 'next/headers';
import { parseUnitPreference, UNITS_COOKIE, type UnitPreference } from './preference';

/** For dynamic server pages: the reader's unit system from the cookie. */
export async function readUnitPreference(): Promise<UnitPreference> {
  return parseUnitPreference((await cookies()).get(UNITS_COOKIE)?.value);
}
