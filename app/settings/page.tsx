import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { isDatabaseUnavailable } from '@/lib/db/errors';
import { initModels } from '@/models';
import { ServiceUnavailable } from '@/components/ServiceUnavailable';
import { SettingsForm, type SettingsValues } from './SettingsForm';
import { MailSettingsForm } from './MailSettingsForm';
import { SignOutEverywhere } from '@/components/account/SignOutEverywhere';
import { loadMailSettings } from '@/lib/mail/settings';
import type { MailSettings } from '@/lib/validation/mail';

export const metadata: Metadata = { title: 'Settings' };
export const dynamic = 'force-dynamic';

const dateFmt = new Intl.DateTimeFormat('en', { day: 'numeric', month: 'long', year: 'numeric', timeZone: 'UTC' });

interface NoticeView {
  id: number;
  message: string;
  link: string | null;
  createdAt: Date;
}

export default async function SettingsPage() {
  let loaded: { handle: string; canApply: boolean; expert: boolean; values: SettingsValues; mail: { settings: MailSettings; tagChoices: { slug: string; name: string }[] }; notices: NoticeView[] } | null = null;
  let refusal: string | null = null;
  try {
    const user = await currentUserInPage();
    if (user && can(user, 'profile.read', user.id)) {
      const { User, Notice } = initModels();
      const row = await User.findByPk(user.id);
      const notices = can(user, 'notice.read', user.id)
        ? await Notice.findAll({
            where: { userId: user.id },
            order: [
              ['createdAt', 'DESC'],
              ['id', 'DESC'],
            ],
            limit: 50,
          })
        : [];
      const mail = await loadMailSettings(user.id);
      if (row && mail) {
        loaded = {
          expert: can(row, 'digest.expertSections'),
          mail,
          handle: row.handle,
          canApply: can(user, 'expertApplication.submit'),
          values: { displayName: row.displayName, region: row.region ?? '', bio: row.bio ?? '', units: row.units },
          notices: notices.map((n) => ({ id: n.id, message: n.message, link: n.link, createdAt: n.createdAt })),
        };
      }
    } else if (user) {
      refusal = REFUSAL['profile.read'];
    }
  } catch (err) {
    if (isDatabaseUnavailable(err)) return <ServiceUnavailable what="your settings" />;
    throw err;
  }

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
        {loaded.notices.length === 0 ? (
          <p className="cw-muted font-sans text-sm">Nothing yet.</p>
        ) : (
          <ol className="flex flex-col gap-2 font-sans">
            {loaded.notices.map((n) => (
              <li key={n.id} className="cw-card py-3">
                <p className="whitespace-pre-line">{n.message}</p>
                <p className="cw-muted mt-1 text-sm">
                  {dateFmt.format(n.createdAt)}
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
