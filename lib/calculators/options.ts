/** Options more than one calculator offers, so they read the same everywhere. */
export const PUMP_TYPE_OPTIONS = [
  { value: 'homemade', label: 'Home-built from fittings' },
  { value: 'commercial', label: 'Cast, factory-made' },
] as const;
