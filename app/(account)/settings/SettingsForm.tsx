'use client';

import { useState, type FormEvent } from 'react';
import { useSession } from 'next-auth/react';
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
  const { units: live, adoptUnits } = useUnits();
  const { update } = useSession();
  // The header's switch saves the same preference: the radios follow it while this page is open.
  const [choice, setChoice] = useState({ units: initial.units, live });
  if (choice.live !== live) setChoice({ units: live, live });
  const units = choice.units;
  const setUnitsChoice = (u: SettingsValues['units']) => setChoice({ units: u, live });
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
      units,
    };
    setBusy(true);
    setError(null);
    setSaved(false);
    const out = await sendJson<SettingsValues>('/api/account/settings', 'PUT', values);
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setSaved(true);
    // The response set the cookie too; this tells the header's switch, refreshes server-drawn
    // numbers and brings the session up to date, so every part of the site agrees at once.
    adoptUnits(out.data.units);
    void update();
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
            <input
              type="radio"
              name="units"
              value="US"
              checked={units === 'US'}
              onChange={() => setUnitsChoice('US')}
            />{' '}
            US (ft, gal)
          </label>
          <label className="flex items-center gap-2">
            <input
              type="radio"
              name="units"
              value="metric"
              checked={units === 'metric'}
              onChange={() => setUnitsChoice('metric')}
            />{' '}
            Metric (m, L)
          </label>
        </div>
        <FieldError error={error} field="units" />
      </fieldset>
      <FieldError error={error} />
      <SaveRow busy={busy} saved={saved} label="Save settings" />
    </form>
  );
}
