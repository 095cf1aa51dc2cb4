'use client';

import { useState, type FormEvent } from 'react';
import { useUnits } from '@/components/units/UnitsProvider';
import { FieldError, inputClass, labelClass, SaveRow, sendJson, type FormError } from '@/components/forms/api';

export interface SettingsValues {
  displayName: string;
  region: string;
  bio: string;
  units: 'US' | 'metric';
}

/** Display name, region, bio and units; the units also switch the whole site at once. */
export function SettingsForm({ initial }: { initial: SettingsValues }) {
  const { setUnits } = useUnits();
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  const [saved, setSaved] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const values: SettingsValues = {
      displayName: String(f.get('displayName') ?? ''),
      region: String(f.get('region') ?? ''),
      bio: String(f.get('bio') ?? ''),
      units: f.get('units') === 'metric' ? 'metric' : 'US',
    };
    setBusy(true);
    setError(null);
    setSaved(false);
    const out = await sendJson<SettingsValues>('/api/account/settings', 'PUT', values);
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setSaved(true);
    // The response set the cookie too; this tells the header's switch and refreshes server-drawn numbers.
    setUnits(out.data.units);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="cw-card flex flex-col gap-4 font-sans">
      <div>
        <label htmlFor="displayName" className={labelClass}>
          Display name
        </label>
        <input
          id="displayName"
          name="displayName"
          defaultValue={initial.displayName}
          minLength={2}
          maxLength={80}
          required
          className={inputClass}
        />
        <FieldError error={error} field="displayName" />
      </div>
      <div>
        <label htmlFor="region" className={labelClass}>
          Region (optional)
        </label>
        <input id="region" name="region" defaultValue={initial.region} maxLength={80} className={inputClass} />
        <FieldError error={error} field="region" />
      </div>
      <div>
        <label htmlFor="bio" className={labelClass}>
          About you (optional)
        </label>
        <textarea id="bio" name="bio" defaultValue={initial.bio} rows={5} maxLength={2000} className={inputClass} />
        <FieldError error={error} field="bio" />
      </div>
      <fieldset>
        <legend className={labelClass}>Units</legend>
        <div className="mt-1 flex gap-4">
          <label className="flex items-center gap-2">
            <input type="radio" name="units" value="US" defaultChecked={initial.units === 'US'} /> US (ft, gal)
          </label>
          <label className="flex items-center gap-2">
            <input type="radio" name="units" value="metric" defaultChecked={initial.units === 'metric'} /> Metric (m, L)
          </label>
        </div>
        <FieldError error={error} field="units" />
      </fieldset>
      <FieldError error={error} />
      <SaveRow busy={busy} saved={saved} label="Save settings" />
    </form>
  );
}
