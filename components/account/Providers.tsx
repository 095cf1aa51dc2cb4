'use client';

import { SessionProvider } from 'next-auth/react';
import type { ReactNode } from 'react';

/** next-auth's session for client components (the header's account menu, expert-only controls). */
export function Providers({ children }: { children: ReactNode }) {
  return <SessionProvider refetchOnWindowFocus={false}>{children}</SessionProvider>;
}
