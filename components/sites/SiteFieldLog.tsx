import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can } from '@/lib/auth/policy';
import { siteTests } from '@/lib/sites/site-tests';
import { trendSentence } from '@/lib/sites/measured';
import type { SiteView } from '@/lib/sites/store';
import { SiteFieldLogTable } from './SiteFieldLogTable';

/**
 * The field log tests recorded on a site, measured against its plan over time, with a
 * sentence on the trend; the owner records the next one from here.
 */
export async function SiteFieldLog({ site }: { site: SiteView }) {
  const viewer = await currentUserInPage();
  const tests = await siteTests(viewer, site.id);
  if (!tests) return null;
  const record = site.mine && can(viewer, 'fieldLog.create');
  return (
    <section aria-labelledby="site-tests" className="cw-card flex flex-col gap-3 font-sans" data-print-hide>
      <div className="flex flex-wrap items-baseline justify-between gap-x-4 gap-y-1">
        <h2 id="site-tests" className="font-serif text-xl font-semibold">
          Tests on this site
        </h2>
        {record ? (
          <Link href={`/field-log/new?site=${site.id}`} className="cw-link inline-flex min-h-6 items-center text-sm">
            Record a test on this site
          </Link>
        ) : null}
      </div>
      {tests.rows.length === 0 ? (
        <p className="cw-muted text-sm">
          No field log tests recorded on this site yet.
          {record ? ' Once the pump is running, catch its delivery in a bucket and record it here.' : ''}
        </p>
      ) : (
        <>
          <p className="max-w-prose" data-testid="site-trend">
            {trendSentence(tests.trend)}
          </p>
          <SiteFieldLogTable rows={tests.rows} />
          <p className="cw-muted max-w-prose text-xs">
            The plan’s figure for each test is what its pumps and pipes deliver at the fall, lift and drive flow
            measured that day, with a typical pump’s efficiency, so a dry month is not held against the pump. Trials
            scatter by a few per cent; read the trend, not a single test.
          </p>
        </>
      )}
    </section>
  );
}
