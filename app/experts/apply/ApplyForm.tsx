'use client';

import { useState, type FormEvent } from 'react';
import { FieldError, inputClass, labelClass, sendJson, type FormError } from '@/components/forms/api';

/** The expert application: what the member has built, and links to their answers here. */
export function ApplyForm({ defaultRegion }: { defaultRegion: string }) {
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  const [sent, setSent] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const num = (name: string) => {
      const raw = String(f.get(name) ?? '').trim();
      return raw === '' ? Number.NaN : Number(raw);
    };
    const links = String(f.get('links') ?? '')
      .split(/\s+/)
      .map((l) => l.trim())
      .filter(Boolean);
    setBusy(true);
    setError(null);
    const out = await sendJson('/api/expert-applications', 'POST', {
      pumpsBuilt: num('pumpsBuilt'),
      years: num('years'),
      region: String(f.get('region') ?? ''),
      experience: String(f.get('experience') ?? ''),
      links,
    });
    setBusy(false);
    if (out.ok) setSent(true);
    else setError(out.error);
  }

  if (sent) {
    return (
      <p role="status" className="cw-card border-moss font-sans">
        Thank you. Your application is with the moderators; you will get a notice in your settings and an e-mail when
        they decide.
      </p>
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="cw-card flex flex-col gap-4 font-sans">
      <div className="grid gap-4 sm:grid-cols-2">
        <div>
          <label htmlFor="pumpsBuilt" className={labelClass}>
            Ram pumps you have built or installed
          </label>
          <input
            id="pumpsBuilt"
            name="pumpsBuilt"
            type="number"
            inputMode="numeric"
            min={0}
            max={10000}
            required
            className={`${inputClass} cw-num`}
          />
          <FieldError error={error} field="pumpsBuilt" />
        </div>
        <div>
          <label htmlFor="years" className={labelClass}>
            Years working with them
          </label>
          <input
            id="years"
            name="years"
            type="number"
            inputMode="numeric"
            min={0}
            max={80}
            required
            className={`${inputClass} cw-num`}
          />
          <FieldError error={error} field="years" />
        </div>
      </div>
      <div>
        <label htmlFor="region" className={labelClass}>
          Where you work
        </label>
        <input
          id="region"
          name="region"
          defaultValue={defaultRegion}
          minLength={2}
          maxLength={80}
          required
          className={inputClass}
        />
        <FieldError error={error} field="region" />
      </div>
      <div>
        <label htmlFor="experience" className={labelClass}>
          Your experience
        </label>
        <p className="cw-muted text-sm">
          Sites, falls and lifts you have worked with, what went wrong and how you fixed it (20–4000 characters).
        </p>
        <textarea
          id="experience"
          name="experience"
          rows={8}
          minLength={20}
          maxLength={4000}
          required
          className={inputClass}
        />
        <FieldError error={error} field="experience" />
      </div>
      <div>
        <label htmlFor="links" className={labelClass}>
          Links (optional, up to 10)
        </label>
        <p className="cw-muted text-sm">Your answers on Clackwater help the moderators most; one web address a line.</p>
        <textarea id="links" name="links" rows={3} className={inputClass} />
        <FieldError error={error} field="links" />
      </div>
      <FieldError error={error} />
      <div>
        <button type="submit" className="cw-button" disabled={busy}>
          {busy ? 'Sending…' : 'Send my application'}
        </button>
      </div>
    </form>
  );
}
