import type { Metadata } from 'next';
import Link from 'next/link';
import { notFound } from 'next/navigation';
import { currentUserInPage } from '@/lib/auth/session';
import { KeepForOffline } from '@/components/sites/KeepForOffline';
import { idParam } from '@/lib/http/guard';
import { getEntry } from '@/lib/field-log/store';
import { loadEntryPage } from '@/lib/field-log/entry-page';
import { trialFlowM3s } from '@/lib/field-log/measure';
import { photoUrl } from '@/lib/photos/storage';
import { Caution } from '@/components/Caution';
import { LinkForm } from '@/components/field-log/LinkForm';
import { material, pumpsWords, shown, size } from '@/components/field-log/format';
import { readUnitPreference } from '@/lib/units/server';
import { withReadings } from '@/lib/units/in-text';
import { formatDate } from '@/lib/dates';

type Params = Promise<{ id: string }>;
export const dynamic = 'force-dynamic';

export async function generateMetadata({ params }: { params: Params }): Promise<Metadata> {
  const id = idParam((await params).id);
  const e = id ? await getEntry(id, null).catch(() => null) : null;
  return e
    ? {
        title: `${e.siteName}, ${formatDate(e.testedOn)}`,
        description: `Field log: ${pumpsWords(e.pumpCount, e.arrangement, e.pumpSize)}, efficiency ${e.performance.dAubuisson.toFixed(2)}`,
      }
    : { title: 'Field log entry' };
}

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <div className="flex justify-between gap-4 border-b border-limestone-300 py-1 dark:border-creek-600">
      <dt className="cw-muted">{label}</dt>
      <dd className="cw-num text-right">{children}</dd>
    </div>
  );
}

export default async function FieldLogEntryPage({ params }: { params: Params }) {
  const id = idParam((await params).id);
  if (!id) notFound();
  const viewer = await currentUserInPage();
  const loaded = await loadEntryPage(id, viewer);
  if (!loaded) notFound();
  const { entry: e, links, photos, mayLink, mayAsk } = loaded;
  const candidates = loaded.linkCandidates.map((r) => ({
    id: r.id,
    label: `${formatDate(r.testedOn)}: ${pumpsWords(r.pumpCount, r.arrangement, r.pumpSize)} (entry ${r.id})`,
  }));
  const p = e.performance;
  const units = await readUnitPreference();
  const flow = (si: number) => shown('flow', si, units);
  const len = (si: number) => shown('length', si, units);

  return (
    <article className="flex flex-col gap-5">
      <header className="flex flex-col gap-1">
        {/* the member's own test: on their phone for offline once opened */}
        {viewer && viewer.id === e.authorId ? (
          <KeepForOffline memberId={viewer.id} path={`/field-log/${e.id}`} button={false} />
        ) : null}
        <p className="font-sans text-sm">
          <Link href="/field-log" className="cw-link">
            Field log
          </Link>
        </p>
        <h1 className="font-serif text-3xl font-semibold">{e.siteName}</h1>
        <p className="cw-muted font-sans text-sm">
          Tested {formatDate(e.testedOn)} by{' '}
          <Link href={`/people/${e.author.handle}`} className="cw-link">
            {e.author.displayName}
          </Link>{' '}
          · {pumpsWords(e.pumpCount, e.arrangement, e.pumpSize)} ({e.pumpType})
        </p>
        {e.hidden || e.deleted ? (
          <p className="font-sans text-sm font-semibold text-clay-600">
            This entry is {e.deleted ? 'deleted' : 'hidden'}; only moderators see it.
          </p>
        ) : null}
      </header>

      <section aria-labelledby="measured-heading" className="cw-card font-sans">
        <h2 id="measured-heading" className="mb-2 font-serif text-xl font-semibold">
          Measured against predicted
        </h2>
        <dl className="grid gap-x-8 sm:grid-cols-2">
          <Row label="Delivered (mean of the trials)">
            <span data-testid="delivered">{flow(e.deliveredFlowM3s)}</span>
          </Row>
          <Row label="Predicted by the yield estimate">{flow(p.predictedDeliveredFlowM3s)}</Row>
          <Row label="Measured ÷ predicted">{p.measuredOverPredicted.toFixed(2)}</Row>
          <Row label="Lift ratio h/H">{p.liftRatio.toFixed(2)}</Row>
          <Row label="Efficiency, D'Aubuisson q·h/(Q·H)">
            <span data-testid="efficiency-d">{p.dAubuisson.toFixed(3)}</span>
          </Row>
          <Row label="Efficiency, Rankine q·(h−H)/((Q−q)·H)">
            <span data-testid="efficiency-r">{p.rankine.toFixed(3)}</span>
          </Row>
          <Row label={`Typical band (${e.pumpType})`}>
            {p.band.low.toFixed(2)}–{p.band.high.toFixed(2)}, typical {p.band.typical.toFixed(2)}
          </Row>
          <Row label="Trial spread">
            {flow(p.spread.min)} to {flow(p.spread.max)}
          </Row>
        </dl>
      </section>

      <section aria-labelledby="trials-heading" className="font-sans">
        <h2 id="trials-heading" className="mb-2 font-serif text-xl font-semibold">
          Bucket trials
        </h2>
        <table className="w-full max-w-md border-collapse text-sm" aria-label="Bucket trials">
          <thead>
            <tr className="border-b border-limestone-400 text-left">
              <th className="px-2 py-1">Trial</th>
              <th className="px-2 py-1">Volume</th>
              <th className="px-2 py-1">Seconds</th>
              <th className="px-2 py-1">Flow</th>
            </tr>
          </thead>
          <tbody>
            {e.trials.map((t, i) => (
              <tr key={i} className="border-b border-limestone-300 dark:border-creek-600">
                <td className="px-2 py-1">{i + 1}</td>
                <td className="cw-num px-2 py-1">{shown('volume', t.volumeL / 1000, units)}</td>
                <td className="cw-num px-2 py-1">{t.seconds}</td>
                <td className="cw-num px-2 py-1">{flow(trialFlowM3s(t))}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section aria-labelledby="site-heading" className="cw-card font-sans">
        <h2 id="site-heading" className="mb-2 font-serif text-xl font-semibold">
          The installation
        </h2>
        <dl className="grid gap-x-8 sm:grid-cols-2">
          <Row label="Fall">
            {len(e.fallM)}
            {e.typed.fall ? ` (typed “${e.typed.fall}”)` : ''}
          </Row>
          <Row label="Lift">
            {len(e.liftM)}
            {e.typed.lift ? ` (typed “${e.typed.lift}”)` : ''}
          </Row>
          <Row label="Drive pipe">
            {len(e.driveLengthM)} of {size(e.driveSize)} {material(e.driveMaterial)}
          </Row>
          <Row label="Delivery line">
            {e.deliveryLengthM !== null
              ? `${len(e.deliveryLengthM)} of ${size(e.deliverySize)} ${material(e.deliveryMaterial)}`
              : 'not recorded'}
          </Row>
          <Row label={`Drive flow (${e.driveFlowMethod})`}>{flow(e.driveFlowM3s)}</Row>
          <Row label="How the drive flow was found">
            {e.driveFlowHow ? <span data-member-words>{withReadings(e.driveFlowHow, units)}</span> : '—'}
          </Row>
          <Row label="Beats per minute">{e.beatsPerMinute ?? '—'}</Row>
          <Row label="Waste valve setting">
            {e.wasteValveSetting ? <span data-member-words>{withReadings(e.wasteValveSetting, units)}</span> : '—'}
          </Row>
          <Row label="Water temperature">{e.waterTempC !== null ? shown('temperature', e.waterTempC, units) : '—'}</Row>
        </dl>
        {e.notes ? (
          <p className="cw-prose mt-3 whitespace-pre-line" data-member-words>
            {withReadings(e.notes, units)}
          </p>
        ) : null}
      </section>

      {photos.length ? (
        <section aria-labelledby="photos-heading">
          <h2 id="photos-heading" className="mb-2 font-serif text-xl font-semibold">
            Photos
          </h2>
          <div className="flex flex-wrap gap-3">
            {photos.map((ph) => (
              <a key={ph.id} href={photoUrl(ph.id)}>
                {/* eslint-disable-next-line @next/next/no-img-element -- our own WebP copies, served by /api/photos */}
                <img
                  src={photoUrl(ph.id, 'thumb')}
                  alt={ph.alt ?? `Photo of ${e.siteName}`}
                  className="h-32 w-auto rounded-md border border-limestone-300"
                  loading="lazy"
                />
              </a>
            ))}
          </div>
        </section>
      ) : null}

      <Caution title="Measuring safely">
        A drive pipe and delivery line hold water under pressure and a waste valve slams hundreds of times a minute:
        keep hands clear while it beats, stop the pump before opening fittings, and follow local codes and licensed
        practice for anything that feeds drinking water.
      </Caution>

      <section aria-labelledby="compare-heading" className="flex flex-col gap-2 font-sans">
        <h2 id="compare-heading" className="font-serif text-xl font-semibold">
          Before and after
        </h2>
        {links.length ? (
          <ul className="list-disc pl-5 text-sm">
            {links.map((l) => (
              <li key={`${l.beforeId}-${l.afterId}`}>
                <Link href={`/field-log/compare/${l.beforeId}/${l.afterId}`} className="cw-link">
                  {l.afterId === id ? `After entry ${l.beforeId}` : `Before entry ${l.afterId}`}: {l.whatChanged}
                </Link>
              </li>
            ))}
          </ul>
        ) : (
          <p className="cw-muted text-sm">Not linked to another test yet.</p>
        )}
        {mayLink ? <LinkForm entryId={id} candidates={candidates} /> : null}
      </section>

      {mayAsk ? (
        <p className="font-sans text-sm">
          <Link href={`/questions/ask?fieldLog=${id}`} className="cw-link">
            Ask a question about this test
          </Link>{' '}
          — the site sheet is filled from it.
        </p>
      ) : null}
    </article>
  );
}
