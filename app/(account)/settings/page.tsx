import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { loadSettingsPage } from '@/lib/accounts/settings-page';
import { SettingsForm } from './SettingsForm';
import { MailSettingsForm } from './MailSettingsForm';
import { SignOutEverywhere } from '@/components/account/SignOutEverywhere';
import { formatDate } from '@/lib/dates';
import { NoticesSeen } from '@/components/account/NoticesSeen';

export const metadata: Metadata = { title: 'Settings' };
export const dynamic = 'force-dynamic';

export default async function SettingsPage() {
  const user = await currentUserInPage();
  const mayRead = user !== null && can(user, 'profile.read', user.id);
  const loaded = user && mayRead ? await loadSettingsPage(user) : null;
  const refusal = user && !mayRead ? REFUSAL['profile.read'] : null;

  if (!loaded) {
    return (
      <div className="flex max-w-2xl flex-col gap-4">
        <h1 className="font-serif text-3xl font-semibold">Settings</h1>
        <p className="cw-card font-sans">
          {refusal ?? (
            <>
              <Link href="/sign-in?callbackUrl=/settings" className="cw-link">
                Sign in
              </Link>{' '}
              to change your settings and read your notices.
            </>
          )}
        </p>
      </div>
    );
  }

  return (
    <div className="flex max-w-2xl flex-col gap-6">
      <header className="flex flex-col gap-1">
        <h1 className="font-serif text-3xl font-semibold">Settings</h1>
        <p className="cw-muted font-sans text-sm">
          Signed in as @{loaded.handle} ·{' '}
          <Link href={`/people/${loaded.handle}`} className="cw-link">
            your public profile
          </Link>
        </p>
      </header>
      <SettingsForm initial={loaded.values} />
      <section className="flex flex-col gap-2">
        <h2 id="email" className="font-serif text-xl font-semibold">
          E-mail
        </h2>
        <MailSettingsForm initial={loaded.mail.settings} tagChoices={loaded.mail.tagChoices} expert={loaded.expert} />
      </section>
      <SignOutEverywhere />
      {loaded.canApply ? (
        <p className="font-sans text-sm">
          Built and tuned ram pumps for others?{' '}
          <Link href="/experts/apply" className="cw-link">
            Apply to be an expert
          </Link>
          .
        </p>
      ) : null}
      <section aria-labelledby="notices" className="flex flex-col gap-2">
        <h2 id="notices" className="font-serif text-xl font-semibold">
          Notices
        </h2>
        {loaded.notices.some((n) => n.fresh) ? <NoticesSeen /> : null}
        {loaded.notices.length === 0 ? (
          <p className="cw-muted font-sans text-sm">
            No notices yet. A moderator’s decision about one of your posts, a change to your role and the answer to an
            expert application arrive here. Answers and replies to your questions come by e-mail, as chosen above.
          </p>
        ) : (
          <ol className="flex flex-col gap-2 font-sans">
            {loaded.notices.map((n) => (
              <li key={n.id} className="cw-card py-3">
                {n.fresh ? (
                  <p className="mb-1 text-xs font-semibold uppercase tracking-wide text-clay-700 dark:text-clay-300">
                    New
                  </p>
                ) : null}
                <p className="whitespace-pre-line">{n.message}</p>
                <p className="cw-muted mt-1 text-sm">
                  {formatDate(n.createdAt)}
                  {n.link && n.link !== '/settings' ? (
                    <>
                      {' · '}
                      <Link href={n.link} className="cw-link">
                        open
                      </Link>
                    </>
                  ) : null}
                </p>
              </li>
            ))}
          </ol>
        )}
      </section>
    </div>
  );
}
