import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage } from '@/lib/auth/session';
import { can, REFUSAL } from '@/lib/auth/policy';
import { initModels } from '@/models';
import { hasPendingApplication } from '@/lib/accounts/roles';
import { ApplyForm } from './ApplyForm';

export const metadata: Metadata = { title: 'Apply to be an expert' };
export const dynamic = 'force-dynamic';

export default async function ApplyForExpertPage() {
  let state: { kind: 'signed-out' } | { kind: 'refused' } | { kind: 'pending' } | { kind: 'form'; region: string };
  const user = await currentUserInPage();
  if (!user) state = { kind: 'signed-out' };
  else if (!can(user, 'expertApplication.submit')) state = { kind: 'refused' };
  else if (await hasPendingApplication(user.id)) state = { kind: 'pending' };
  else {
    const row = await initModels().User.findByPk(user.id, { attributes: ['region'] });
    state = { kind: 'form', region: row?.region ?? '' };
  }

  return (
    <div className="flex max-w-2xl flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Apply to be an expert</h1>
      <div className="cw-prose">
        <p>
          Experts are builders and installers who have put ram pumps to work and can say why one stops. Their answers
          are labelled as an expert’s, they record safety checks on guides, and their “unsafe advice” flag hides a post
          until a moderator looks at it. A moderator reads every application.
        </p>
      </div>
      {state.kind === 'signed-out' ? (
        <p className="cw-card font-sans">
          <Link href="/sign-in?callbackUrl=/experts/apply" className="cw-link">
            Sign in
          </Link>{' '}
          to apply for expert standing.
        </p>
      ) : state.kind === 'refused' ? (
        <p className="cw-card font-sans">{REFUSAL['expertApplication.submit']}</p>
      ) : state.kind === 'pending' ? (
        <p role="status" className="cw-card font-sans">
          Your application is waiting for a moderator. You will get a notice in your{' '}
          <Link href="/settings" className="cw-link">
            settings
          </Link>{' '}
          when they decide.
        </p>
      ) : (
        <ApplyForm defaultRegion={state.region} />
      )}
    </div>
  );
}
