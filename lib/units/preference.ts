/** The reader's unit system, kept in a cookie so every page can follow it. */
export const UNITS_COOKIE = 'cw_units';
export const UNIT_SYSTEMS = ['US', 'metric'] as const;
export type UnitPreference = (typeof UNIT_SYSTEMS)[number];
export const DEFAULT_UNITS: UnitPreference = 'US';
/** The cookie lasts a year; not httpOnly, since the header's switch reads and writes it in the browser. */
export const UNITS_COOKIE_OPTIONS = { path: '/', maxAge: 60 * 60 * 24 * 365, sameSite: 'lax' } as const;

export function parseUnitPreference(value: string | undefined | null): UnitPreference {
  return value === 'metric' ? 'metric' : value === 'US' ? 'US' : DEFAULT_UNITS;
}

/** The reader's unit system from a request's Cookie header (route handlers, which read no page cookies). */
export function unitPreferenceOf(request: Request): UnitPreference {
  const m = (request.headers.get('cookie') ?? '').match(new RegExp(`(?:^|;\\s*)${UNITS_COOKIE}=([^;]*)`));
  return parseUnitPreference(m?.[1]);
}
