import type { Metadata } from 'next';
import { ResetPasswordForm } from '@/components/account/reset-password-form';

export const metadata: Metadata = { title: 'Choose a new password' };

type Props = { searchParams: Promise<{ token?: string }> };

export default async function ResetConfirmPage({ searchParams }: Props) {
  const { token } = await searchParams;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Choose a new password</h1>
      <ResetPasswordForm token={token ?? ''} />
    </section>
  );
}
