import 'next-auth';
import 'next-auth/jwt';

declare module 'next-auth' {
  interface Session {
    user: {
      id: number;
      role: string;
      handle: string;
      /** the member's saved unit system, read fresh with every session */
      units: 'US' | 'metric';
      /** notices not yet read (the header's badge), counted fresh with every session */
      unreadNotices: number;
      name?: string | null;
      email?: string | null;
    };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    uid?: number;
    role?: string;
    handle?: string;
    /** the account's session version at sign-in (lib/auth/session-version.ts) */
    sv?: number;
    /** the saved unit system ('US' | 'metric') */
    units?: string;
    unread?: number;
  }
}
