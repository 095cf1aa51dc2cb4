'use client';

import { usePathname } from 'next/navigation';
import useSWR from 'swr';
import { getJsonOrNull } from '@/components/forms/api';
import { Thread, useViewer } from './Thread';
import type { ThreadView } from '@/lib/questions/thread';
import { can, sessionActor } from '@/lib/auth/policy';

/**
 * On a question's "not found" page: a hidden or deleted question is not found for
 * readers, and the page says so to everyone alike; a moderator's browser fetches the
 * thread with their session and shows it, marked.
 */
export function ModeratorThread({ children }: { children: React.ReactNode }) {
  const viewer = useViewer();
  const id = /^\/questions\/(\d{1,10})$/.exec(usePathname() ?? '')?.[1];
  const moderator = can(sessionActor(viewer), 'moderation.seeHidden');
  const { data } = useSWR(moderator && id ? `/api/questions/${id}` : null, getJsonOrNull<ThreadView>);
  if (!data) return <>{children}</>;
  return (
    <article className="flex flex-col gap-5">
      <p role="status" className="cw-card font-sans text-sm font-semibold">
        Members and signed-out readers get “nothing here” for this question: it is{' '}
        {data.deletedAt ? 'deleted' : 'hidden'}. You see it as a moderator.
      </p>
      <h1 className="font-serif text-3xl font-semibold leading-tight">{data.title}</h1>
      <Thread initial={data} />
    </article>
  );
}
