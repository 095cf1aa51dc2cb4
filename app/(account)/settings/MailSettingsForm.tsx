'use client';

import { useState, type FormEvent } from 'react';
import { FieldError, labelClass, SaveRow, sendJson, type FormError } from '@/components/forms/api';
import type { MailSettings } from '@/lib/validation/mail';

const SWITCHES: { key: keyof MailSettings['notify']; label: string }[] = [
  { key: 'answers', label: 'An answer to one of my questions' },
  { key: 'replies', label: 'A reply to one of my posts' },
  { key: 'fixed', label: 'The asker says my answer fixed it' },
  { key: 'moderation', label: 'A moderator acts on one of my posts' },
  { key: 'expert', label: 'A decision on my expert application' },
];

/** The digest (off, daily, weekly), the tags it follows, and each notification. */
export function MailSettingsForm({
  initial,
  tagChoices,
  expert,
}: {
  initial: MailSettings;
  tagChoices: { slug: string; name: string }[];
  expert: boolean;
}) {
  const [error, setError] = useState<FormError | null>(null);
  const [busy, setBusy] = useState(false);
  const [saved, setSaved] = useState(false);

  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const digest = String(f.get('digest') ?? 'off') as MailSettings['digest'];
    const values: MailSettings = {
      digest,
      tags: f.getAll('tags').map(String),
      notify: Object.fromEntries(
        SWITCHES.map((s) => [s.key, f.get(`notify-${s.key}`) === 'on']),
      ) as MailSettings['notify'],
    };
    setBusy(true);
    setError(null);
    setSaved(false);
    const out = await sendJson<MailSettings>('/api/account/mail', 'PUT', values);
    setBusy(false);
    if (!out.ok) return setError(out.error);
    setSaved(true);
  }

  return (
    <form onSubmit={onSubmit} noValidate aria-labelledby="email" className="cw-card flex flex-col gap-4 font-sans">
      <fieldset>
        <legend className={labelClass}>Digest</legend>
        <div className="mt-1 flex flex-wrap gap-4">
          {(['off', 'daily', 'weekly'] as const).map((d) => (
            <label key={d} className="flex items-center gap-2">
              <input type="radio" name="digest" value={d} defaultChecked={initial.digest === d} />{' '}
              {d === 'off' ? 'Off' : d === 'daily' ? 'Daily' : 'Weekly'}
            </label>
          ))}
        </div>
        <p className="cw-muted mt-1 text-sm">
          New questions in the tags you follow and guides added or changed
          {expert
            ? '; as an expert, also questions in your tags still waiting for an answer, and guides whose safety check is out of date'
            : ''}
          .
        </p>
        <FieldError error={error} field="digest" />
      </fieldset>
      <fieldset>
        <legend className={labelClass}>Tags I follow</legend>
        <div className="mt-1 grid grid-cols-1 gap-1 sm:grid-cols-2">
          {tagChoices.map((t) => (
            <label key={t.slug} className="flex items-center gap-2">
              <input type="checkbox" name="tags" value={t.slug} defaultChecked={initial.tags.includes(t.slug)} />{' '}
              {t.name}
            </label>
          ))}
        </div>
        <FieldError error={error} field="tags" />
      </fieldset>
      <fieldset>
        <legend className={labelClass}>E-mail me when</legend>
        <div className="mt-1 flex flex-col gap-1">
          {SWITCHES.map((s) => (
            <label key={s.key} className="flex items-center gap-2">
              <input type="checkbox" name={`notify-${s.key}`} defaultChecked={initial.notify[s.key]} /> {s.label}
            </label>
          ))}
        </div>
        <FieldError error={error} field="notify" />
      </fieldset>
      <FieldError error={error} />
      <SaveRow busy={busy} saved={saved} label="Save e-mail settings" />
    </form>
  );
}
