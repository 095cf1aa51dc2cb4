'use client';

import { useUnits } from './UnitsProvider';
import { UNIT_SYSTEMS } from '@/lib/units/preference';

const LABEL = { US: 'US (ft, gal)', metric: 'Metric (m, L)' } as const;

/** The header's US/metric switch; every number on the site follows it. */
export function UnitSwitch() {
  const { units, setUnits } = useUnits();
  return (
    <fieldset className="flex items-center gap-1 text-xs" aria-label="Units">
      <legend className="sr-only">Units</legend>
      {UNIT_SYSTEMS.map((u) => (
        <label
          key={u}
          className={`cursor-pointer rounded px-2 py-1 ${units === u ? 'bg-limestone-100 font-semibold text-creek' : 'text-limestone-100 hover:bg-creek-600'}`}
        >
          <input
            type="radio"
            name="units"
            value={u}
            checked={units === u}
            onChange={() => setUnits(u)}
            className="sr-only"
          />
          <span title={LABEL[u]}>{u === 'US' ? 'US' : 'Metric'}</span>
        </label>
      ))}
    </fieldset>
  );
}
