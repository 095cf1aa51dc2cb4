import type { Metadata } from 'next';
import { SignUpForm } from '@/components/account/SignUpForm';

export const metadata: Metadata = { title: 'Sign up', robots: { index: false } };

export default function SignUpPage() {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Sign up</h1>
      <p className="cw-prose cw-muted">
        Members ask and answer, save worked calculations and keep a field log. Reading needs no account.
      </p>
      <SignUpForm />
    </div>
  );
}
