'use client';

import Link from 'next/link';
import { signOut, useSession } from 'next-auth/react';
import { can, sessionActor } from '@/lib/auth/policy';

/** Sign in, or the member's name with settings and sign out. */
export function AccountMenu() {
  const { data, status } = useSession();
  const actor = sessionActor(data?.user);
  if (status === 'loading') return <span className="w-16" aria-hidden="true" />;
  if (!data?.user) {
    return (
      <Link href="/sign-in" className="whitespace-nowrap text-sm font-medium no-underline hover:underline">
        Sign in
      </Link>
    );
  }
  return (
    <details className="relative text-sm" data-testid="account-menu">
      <summary className="cursor-pointer list-none whitespace-nowrap font-medium">
        {data.user.name ?? data.user.handle}
      </summary>
      <div className="absolute right-0 z-20 mt-2 flex w-44 flex-col gap-2 rounded-md border border-creek-400 bg-creek-800 p-3 shadow-lg">
        <Link href={`/people/${data.user.handle}`} className="no-underline hover:underline">
          Profile
        </Link>
        <Link href="/settings" className="no-underline hover:underline">
          Settings
        </Link>
        {can(actor, 'expertApplication.decide') ? (
          <Link href="/review/experts" className="no-underline hover:underline">
            Expert applications
          </Link>
        ) : null}
        {can(actor, 'user.changeRole') ? (
          <>
            <Link href="/admin/users" className="no-underline hover:underline">
              Members and roles
            </Link>
            <Link href="/admin/outbox" className="no-underline hover:underline">
              E-mail outbox
            </Link>
          </>
        ) : null}
        <button type="button" className="text-left hover:underline" onClick={() => void signOut({ callbackUrl: '/' })}>
          Sign out
        </button>
      </div>
    </details>
  );
}
