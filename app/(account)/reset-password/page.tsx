import type { Metadata } from 'next';
import { ResetRequestForm } from '@/components/account/ResetForms';

export const metadata: Metadata = { title: 'Reset your password', robots: { index: false } };

export default function ResetPasswordPage() {
  return (
    <div className="flex flex-col gap-4">
      <h1 className="font-serif text-3xl font-semibold">Reset your password</h1>
      <ResetRequestForm />
    </div>
  );
}
