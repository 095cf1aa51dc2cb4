import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { listPendingApplications, type PendingApplicationView } from '@/lib/accounts/roles';
import { Refused } from '@/components/account/Refused';
import { DecisionForm } from './DecisionForm';
import { formatDate } from '@/lib/dates';

export const metadata: Metadata = { title: 'Expert applications' };
export const dynamic = 'force-dynamic';

export default async function ReviewExpertsPage() {
  let applications: PendingApplicationView[] | null = null;
  let viewerId = 0;
  let signedIn = false;
  const user = await currentUserInPage();
  signedIn = user !== null;
  if (user && can(user, 'expertApplication.decide')) {
    viewerId = user.id;
    applications = await listPendingApplications();
  }

  if (!applications) {
    return (
      <Refused
        title="Expert applications"
        message={REFUSAL['expertApplication.decide']}
        signedIn={signedIn}
        signInTo="/review/experts"
      />
    );
  }

  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Expert applications</h1>
      <p className="cw-muted font-sans text-sm">
        {applications.length === 0
          ? 'No applications are waiting. Members apply from their settings; each new one appears here.'
          : `${applications.length} waiting, oldest first. Your note is sent to the applicant with the decision.`}{' '}
        Flagged posts and appeals are in the{' '}
        <Link href="/review" className="cw-link">
          review queue
        </Link>
        .
      </p>
      <ol className="flex flex-col gap-4">
        {applications.map((a) => (
          <li key={a.id} className="cw-card flex flex-col gap-3">
            <div className="font-sans">
              <h2 className="text-lg font-semibold">
                <Link href={`/people/${a.applicant.handle}`} className="cw-link">
                  {a.applicant.displayName}
                </Link>{' '}
                <span className="cw-muted text-sm font-normal">@{a.applicant.handle}</span>
              </h2>
              <p className="cw-muted text-sm">
                applied {formatDate(a.createdAt)} · {a.region} · <span className="cw-num">{a.pumpsBuilt}</span> pumps
                built · <span className="cw-num">{a.years}</span> years
              </p>
            </div>
            <p className="cw-prose whitespace-pre-line">{a.experience}</p>
            {a.links.length > 0 ? (
              <ul className="flex flex-col gap-1 font-sans text-sm">
                {a.links.map((l) => (
                  <li key={l}>
                    <a href={l} className="cw-link break-all" rel="nofollow noopener noreferrer" target="_blank">
                      {l}
                    </a>
                  </li>
                ))}
              </ul>
            ) : null}
            {a.applicant.id === viewerId ? (
              <p className="cw-muted font-sans text-sm">This is your own application: another moderator decides it.</p>
            ) : (
              <DecisionForm applicationId={a.id} applicantName={a.applicant.displayName} />
            )}
          </li>
        ))}
      </ol>
    </div>
  );
}
