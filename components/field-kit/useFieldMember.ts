'use client';

import { useContext, useEffect, useState } from 'react';
import { SessionContext } from 'next-auth/react';
import type { Actor } from '@/lib/auth/policy';
import { memberWhenUnreachable, rememberMember, type KnownMember } from '@/lib/offline/member';

export interface FieldMember {
  actor: Actor | null;
  handle: string | null;
  /** true when the member is the one this phone last knew, the server out of reach */
  offline: boolean;
}

/**
 * Who is recording: the session's member, kept on the phone while signed in; with no
 * signal, the member the phone last knew (lib/offline/member.ts), so the field kit
 * offers to record into the outbox rather than to sign in.
 */
export function useFieldMember(): FieldMember {
  const session = useContext(SessionContext);
  const status = session?.status;
  const user = session?.data?.user;
  const [unreachable, setUnreachable] = useState<KnownMember | null>(null);
  const id = user?.id;
  const handle = user?.handle;
  const role = user?.role;
  const units = user?.units;

  useEffect(() => {
    if (status === 'authenticated' && id && handle && role && units) {
      rememberMember({ id: Number(id), handle, role, units });
      return;
    }
    if (status !== 'unauthenticated') return;
    let live = true;
    void memberWhenUnreachable().then((m) => {
      if (live) setUnreachable(m);
    });
    return () => {
      live = false;
    };
  }, [status, id, handle, role, units]);

  if (user)
    return { actor: { id: Number(user.id), role: user.role as Actor['role'] }, handle: user.handle, offline: false };
  if (status === 'unauthenticated' && unreachable)
    return {
      actor: { id: unreachable.id, role: unreachable.role as Actor['role'] },
      handle: unreachable.handle,
      offline: true,
    };
  return { actor: null, handle: null, offline: false };
}

/** Keeps the phone's memory of the member in step on every page (mounted once, in Providers). */
export function MemberMemory() {
  useFieldMember();
  return null;
}
