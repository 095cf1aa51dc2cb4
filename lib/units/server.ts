import { cookies } from 'next/headers';
import { parseUnitPreference, UNITS_COOKIE, UNITS_COOKIE_OPTIONS, type UnitPreference } from './preference';

/** For dynamic server pages: the reader's unit system from the cookie. */
export async function readUnitPreference(): Promise<UnitPreference> {
  return parseUnitPreference((await cookies()).get(UNITS_COOKIE)?.value);
}

/**
 * Sets the units cookie on the response being built, when there is one to set it on:
 * next-auth's sign-in callback runs in a route handler, where Next adds cookies set
 * here to the response. Elsewhere (a server component reading the session) the cookie
 * cannot be set and the browser's UnitsProvider aligns it instead.
 */
export async function rememberUnits(units: UnitPreference): Promise<void> {
  try {
    const jar = await cookies();
    if (jar.get(UNITS_COOKIE)?.value !== units) jar.set(UNITS_COOKIE, units, UNITS_COOKIE_OPTIONS);
  } catch {
    /* not in a route handler: nothing to set it on */
  }
}
