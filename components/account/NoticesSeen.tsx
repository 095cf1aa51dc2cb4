'use client';

import { useEffect } from 'react';
import { useSession } from 'next-auth/react';

/**
 * The settings page has marked the notices read on the server; the header's badge comes
 * from the session, so ask for a fresh one once, only when there were new notices.
 */
export function NoticesSeen() {
  const { update } = useSession();
  useEffect(() => {
    void update();
    // once per visit: update changes identity with each session
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);
  return null;
}
