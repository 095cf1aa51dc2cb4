import type { Metadata } from 'next';
import { NewPasswordForm } from '@/components/account/ResetForms';

export const metadata: Metadata = { title: 'Choose a new password', robots: { index: false } };

export default async function NewPasswordPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const token = (await searchParams).token;
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Choose a new password</h1>
      {typeof token === 'string' ? (
        <NewPasswordForm token={token} />
      ) : (
        <p role="alert">This link is missing its token; open it from the e-mail again.</p>
      )}
    </div>
  );
}
