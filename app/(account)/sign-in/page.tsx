import type { Metadata } from 'next';
import { SignInForms } from '@/components/account/SignInForms';
import { safeReturnPath } from '@/lib/auth/return-path';

export const metadata: Metadata = { title: 'Sign in', robots: { index: false } };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const sp = await searchParams;
  const cb = safeReturnPath(sp.callbackUrl);
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Sign in</h1>
      <SignInForms callbackUrl={cb} />
    </div>
  );
}
