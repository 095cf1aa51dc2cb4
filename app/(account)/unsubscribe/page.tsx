import type { Metadata } from 'next';
import Link from 'next/link';
import { SCOPE_WORDS, unsubscribeQuery, verifyUnsubscribe } from '@/lib/mail/unsubscribe';
import { UnsubscribeButton } from './UnsubscribeButton';

export const metadata: Metadata = { title: 'Stop e-mail', robots: { index: false } };
export const dynamic = 'force-dynamic';

/** Where the link at the foot of every message lands; works signed out. */
export default async function UnsubscribePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const sp = await searchParams;
  const one = (v: string | string[] | undefined) => (typeof v === 'string' ? v : null);
  const check = verifyUnsubscribe({ u: one(sp.u), s: one(sp.s), t: one(sp.t) });
  return (
    <div className="flex max-w-2xl flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Stop e-mail</h1>
      {check.ok ? (
        <>
          <p className="font-sans">
            This switches off {SCOPE_WORDS[check.scope]} for the account the message was sent to. Sign-in links and
            password resets still come when you ask for them.
          </p>
          <UnsubscribeButton
            query={unsubscribeQuery(check.userId, check.scope)}
            label={`Switch off ${SCOPE_WORDS[check.scope]}`}
          />
        </>
      ) : (
        <p role="alert" className="cw-card font-sans">
          {check.message}
        </p>
      )}
      <p className="cw-muted font-sans text-sm">
        Signed in, you can choose each kind of e-mail in{' '}
        <Link href="/settings#email" className="cw-link">
          your settings
        </Link>
        .
      </p>
    </div>
  );
}
