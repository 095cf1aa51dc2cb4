import type { Metadata } from 'next';
import { TokenAction } from '@/components/account/TokenAction';

export const metadata: Metadata = { title: 'Confirm your e-mail', robots: { index: false } };

export default async function VerifyEmailPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const token = (await searchParams).token;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Confirm your e-mail</h1>
      {typeof token === 'string' ? (
        <TokenAction token={token} />
      ) : (
        <p role="alert">This link is missing its token; open it from the e-mail again.</p>
      )}
    </div>
  );
}
