import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUserInPage, type SessionUser } from '@/lib/auth/session';
import { can, refusedBySuspension, REFUSAL } from '@/lib/auth/policy';
import { Refused } from '@/components/account/Refused';
import { ReviewQueue } from '@/components/moderation/ReviewQueue';
import { SuspendedMembers } from '@/components/moderation/SuspendedMembers';

export const metadata: Metadata = { title: 'Review queue' };
export const dynamic = 'force-dynamic';

/** The moderators' review queue; the list itself loads in the browser so it can refresh after each action. */
export default async function ReviewPage() {
  const user: SessionUser | null = await currentUserInPage();

  if (!user || !can(user, 'moderation.act')) {
    const message =
      user && refusedBySuspension(user, 'moderation.act')
        ? 'Your account is suspended: the review queue is closed to you until the suspension ends.'
        : REFUSAL['moderation.act'];
    return <Refused title="Review queue" message={message} signedIn={user !== null} signInTo="/review" />;
  }

  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Review queue</h1>
      <p className="cw-muted font-sans text-sm">
        Posts members have flagged. Read each in its thread before acting; every action needs a reason, which the author
        sees and the audit log keeps. Expert applications are under{' '}
        <Link href="/review/experts" className="cw-link">
          expert applications
        </Link>
        .
      </p>
      <ReviewQueue viewer={{ id: user.id, handle: user.handle, role: user.role }} />
      <SuspendedMembers />
    </div>
  );
}
