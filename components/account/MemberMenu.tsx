'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import { useEffect, useRef } from 'react';
import { signOut } from 'next-auth/react';
import type { Session } from 'next-auth';
import { can, sessionActor, type Action } from '@/lib/auth/policy';

/** The workspaces a role may open, each behind the policy row that opens it. */
const TOOLS: { href: string; label: string; action: Action }[] = [
  { href: '/review', label: 'Review queue', action: 'moderation.act' },
  { href: '/review/experts', label: 'Expert applications', action: 'expertApplication.decide' },
  { href: '/admin/users', label: 'Members and roles', action: 'user.changeRole' },
  { href: '/admin/audit', label: 'Audit log', action: 'audit.read' },
  { href: '/admin/outbox', label: 'E-mail outbox', action: 'mail.outbox' },
];

const ITEM =
  'flex min-h-10 items-center rounded px-3 text-left no-underline hover:bg-creek-600 hover:underline focus-visible:-outline-offset-2';

type SessionUser = NonNullable<Session['user']>;

/** The member's name opening their pages, the tools their role may use, and sign out. */
export default function MemberMenu({ user }: { user: SessionUser }) {
  const actor = sessionActor(user);
  const menu = useRef<HTMLDetailsElement>(null);
  const pathname = usePathname();

  // the header stays while pages change under it: close the menu once the page has changed
  useEffect(() => {
    if (menu.current) menu.current.open = false;
  }, [pathname]);

  // a click elsewhere or Escape closes it, as a menu does
  useEffect(() => {
    const onPointer = (e: PointerEvent) => {
      if (menu.current?.open && !menu.current.contains(e.target as Node)) menu.current.open = false;
    };
    const onKey = (e: KeyboardEvent) => {
      if (e.key !== 'Escape' || !menu.current?.open) return;
      menu.current.open = false;
      menu.current.querySelector('summary')?.focus();
    };
    document.addEventListener('pointerdown', onPointer);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', onPointer);
      document.removeEventListener('keydown', onKey);
    };
  }, []);

  const name = user.name ?? user.handle;
  const tools = TOOLS.filter((t) => can(actor, t.action));
  const close = () => {
    if (menu.current) menu.current.open = false;
  };
  return (
    <details ref={menu} className="group relative text-sm" data-testid="account-menu">
      <summary
        className="flex min-h-10 max-w-[6rem] cursor-pointer list-none items-center gap-1 rounded-md px-2 font-medium group-open:bg-creek-600 hover:bg-creek-600 sm:max-w-[12rem] lg:max-w-[10rem] [&::-webkit-details-marker]:hidden"
        title={name}
      >
        <span className="truncate">{name}</span>
        {user.unreadNotices > 0 ? (
          <span
            className="shrink-0 rounded-full bg-signal-200 px-1.5 text-xs leading-5 font-semibold text-creek-900"
            data-testid="notice-badge"
          >
            {user.unreadNotices}
            <span className="sr-only">{user.unreadNotices === 1 ? ' unread notice' : ' unread notices'}</span>
          </span>
        ) : null}
        <svg
          viewBox="0 0 12 12"
          className="h-3 w-3 shrink-0 transition-transform group-open:rotate-180"
          aria-hidden="true"
        >
          <path d="M2 4l4 4 4-4" fill="none" stroke="currentColor" strokeWidth="1.6" />
        </svg>
      </summary>
      <div className="absolute right-0 z-30 mt-2 flex w-60 flex-col gap-0.5 rounded-md border border-creek-400 bg-creek-800 p-2 shadow-lg dark:bg-creek-950">
        <p className="flex flex-col px-3 pt-1 pb-2 text-xs text-creek-100">
          <span>Signed in as</span>
          <span className="truncate text-sm font-semibold text-limestone-50">{name}</span>
          <span className="truncate">@{user.handle}</span>
        </p>
        <Link href={`/people/${user.handle}`} className={ITEM} onClick={close}>
          Profile
        </Link>
        <Link href="/settings" className={ITEM} onClick={close}>
          Settings and notices
          {user.unreadNotices > 0 ? ` (${user.unreadNotices} new)` : ''}
        </Link>
        {tools.length ? (
          <div
            role="group"
            aria-labelledby="account-menu-tools"
            className="mt-1 flex flex-col gap-0.5 border-t border-creek-600 pt-2"
          >
            <p
              id="account-menu-tools"
              className="px-3 pb-1 text-xs font-semibold tracking-wide text-creek-100 uppercase"
            >
              {can(actor, 'user.changeRole') ? 'Moderation and admin' : 'Moderation'}
            </p>
            {tools.map((t) => (
              <Link key={t.href} href={t.href} className={ITEM} onClick={close}>
                {t.label}
              </Link>
            ))}
          </div>
        ) : null}
        <div className="mt-1 border-t border-creek-600 pt-1">
          <button type="button" className={`${ITEM} w-full`} onClick={() => void signOut({ callbackUrl: '/' })}>
            Sign out
          </button>
        </div>
      </div>
    </details>
  );
}
