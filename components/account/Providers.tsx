'use client';

import { SessionProvider } from 'next-auth/react';
import type { ReactNode } from 'react';
import { MemberMemory } from '@/components/field-kit/useFieldMember';

/** next-auth's session for client components (the header's account menu, expert-only controls). */
export function Providers({ children }: { children: ReactNode }) {
  return (
    <SessionProvider refetchOnWindowFocus={false}>
      {/* the member a page opened with no signal records as (the field kit) */}
      <MemberMemory />
      {children}
    </SessionProvider>
  );
}
