'use client';

import { useUnits } from './UnitsProvider';
import { UNIT_SYSTEMS } from '@/lib/units/preference';

const LABEL = { US: 'US (ft, gal)', metric: 'Metric (m, L)' } as const;

/** The header's US/metric switch; every number on the site follows it. */
export function UnitSwitch() {
  const { units, setUnits } = useUnits();
  return (
    <fieldset className="flex items-center gap-0.5 rounded-md border border-creek-200 p-0.5 text-xs" aria-label="Units">
      <legend className="sr-only">Units</legend>
      {UNIT_SYSTEMS.map((u) => (
        <label
          key={u}
          className={`inline-flex min-h-7 cursor-pointer items-center rounded px-1.5 has-[input:focus-visible]:outline-2 has-[input:focus-visible]:outline-offset-2 has-[input:focus-visible]:outline-clay-300 ${units === u ? 'bg-limestone-100 font-semibold text-creek' : 'text-limestone-100 hover:bg-creek-600'}`}
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
