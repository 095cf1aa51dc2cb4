import type { Metadata } from 'next';
import Link from 'next/link';
import 'katex/dist/katex.min.css';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { initModels } from '@/models';
import { AskForm } from '@/components/questions/AskForm';
import { getEntry } from '@/lib/field-log/store';
import { entrySiteSheet } from '@/lib/calculators/site-sheet';
import { readUnitPreference } from '@/lib/units/server';
import { idParam } from '@/lib/http/guard';
import { askFromSite } from '@/lib/sites/links';

export const metadata: Metadata = { title: 'Ask a question' };
export const dynamic = 'force-dynamic';

const SLUG = /^[a-z0-9-]{1,80}$/;

export default async function AskQuestionPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (typeof v === 'string' && SLUG.test(v) ? v : undefined);

  const fieldLogId = typeof sp.fieldLog === 'string' ? idParam(sp.fieldLog) : undefined;
  let fromFieldLog: { id: number; siteSheet: ReturnType<typeof entrySiteSheet> } | undefined;
  let fromSite: NonNullable<Awaited<ReturnType<typeof askFromSite>>> | undefined;
  const siteParam = typeof sp.site === 'string' && /^[0-9A-Za-z]{6,16}$/.test(sp.site) ? sp.site : undefined;
  let state: { kind: 'signed-out' } | { kind: 'refused' } | { kind: 'form'; tags: { slug: string; name: string }[] };
  const user = await currentUserInPage();
  if (!user) state = { kind: 'signed-out' };
  else if (!can(user, 'question.ask')) state = { kind: 'refused' };
  else {
    const rows = await initModels().Tag.findAll({ attributes: ['slug', 'name'], order: [['name', 'ASC']] });
    state = { kind: 'form', tags: rows.map((t) => ({ slug: t.slug, name: t.name })) };
    const entry = fieldLogId ? await getEntry(fieldLogId, user) : null;
    if (entry && !entry.hidden && !entry.deleted)
      fromFieldLog = { id: entry.id, siteSheet: entrySiteSheet(entry, await readUnitPreference()) };
    // the asker's own site only: anyone else's opens the form without it
    if (siteParam) fromSite = (await askFromSite(user, siteParam, await readUnitPreference())) ?? undefined;
  }

  const tag = one(sp.tag);
  return (
    <div className="flex flex-col gap-4">
      <div className="flex max-w-prose flex-col gap-2">
        <h1 className="font-serif text-3xl font-semibold">Ask a question</h1>
        <p className="cw-prose cw-muted">
          Say what you built and what it does. The site sheet carries your measurements, so the people who answer can
          work with your numbers.
        </p>
      </div>
      {fromFieldLog ? (
        <p className="cw-muted max-w-prose font-sans text-sm" data-testid="from-field-log">
          The site sheet is filled from{' '}
          <Link href={`/field-log/${fromFieldLog.id}`} className="cw-link">
            field log entry {fromFieldLog.id}
          </Link>
          ; the question will link to it.
        </p>
      ) : null}
      {fromSite ? (
        <p className="cw-muted max-w-prose font-sans text-sm" data-testid="from-site">
          {fromFieldLog ? 'The question will be about your site ' : 'The site sheet is filled from your site '}
          <Link href={`/sites/${fromSite.id}`} className="cw-link">
            {fromSite.name}
          </Link>
          {fromFieldLog ? '.' : ', its newest plan; the question will link to it.'}
        </p>
      ) : null}
      {state.kind === 'signed-out' ? (
        <p className="cw-card max-w-prose font-sans">
          <Link
            href={`/sign-in?callbackUrl=${encodeURIComponent(siteParam ? `/questions/ask?site=${siteParam}` : '/questions/ask')}`}
            className="cw-link"
          >
            Sign in to ask
          </Link>{' '}
          a question. Reading and the calculators need no account.
        </p>
      ) : state.kind === 'refused' ? (
        <p className="cw-card max-w-prose font-sans">{REFUSAL['question.ask']}</p>
      ) : (
        <AskForm
          tags={state.tags}
          defaultTag={tag && state.tags.some((t) => t.slug === tag) ? tag : undefined}
          guide={one(sp.guide)}
          fromFieldLog={fromFieldLog}
          fromSite={fromSite}
        />
      )}
    </div>
  );
}
