'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { lazy, Suspense } from 'react';
import { useSession } from 'next-auth/react';
import { signInPath } from '@/lib/auth/return-path';

// A member's menu (and the policy table it asks) loads only for a member: a visitor's
// pages, a guide's first load among them, carry just the sign-in link.
const MemberMenu = lazy(() => import('./MemberMenu'));

const HOLDER = <span className="inline-block min-h-10 w-16" aria-hidden="true" />;

/** Sign in, or the member's menu. */
export function AccountMenu() {
  const { data, status } = useSession();
  const pathname = usePathname();
  if (status === 'loading') return HOLDER;
  if (!data?.user) {
    return (
      <Link
        href={signInPath(pathname)}
        className="inline-flex min-h-10 items-center rounded px-1 text-sm font-medium whitespace-nowrap no-underline hover:underline"
      >
        Sign in
      </Link>
    );
  }
  return (
    <Suspense fallback={HOLDER}>
      <MemberMenu user={data.user} />
    </Suspense>
  );
}
