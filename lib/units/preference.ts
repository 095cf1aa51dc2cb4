/** The reader's unit system, kept in a cookie so every page can follow it. */
export const UNITS_COOKIE = 'cw_units';
export const UNIT_SYSTEMS = ['US', 'metric'] as const;
export type UnitPreference = (typeof UNIT_SYSTEMS)[number];
export const DEFAULT_UNITS: UnitPreference = 'US';

export function parseUnitPreference(value: string | undefined | null): UnitPreference {
  return value === 'metric' ? 'metric' : value === 'US' ? 'US' : DEFAULT_UNITS;
}
