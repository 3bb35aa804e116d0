import type { Metadata } from 'next';
import { TokenAction } from '@/components/account/token-action';

export const metadata: Metadata = { title: 'Confirm your e-mail address' };

type Props = { searchParams: Promise<{ token?: string }> };

export default async function VerifyEmailPage({ searchParams }: Props) {
  const { token } = await searchParams;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Confirm your e-mail address</h1>
      <TokenAction
        endpoint="/api/v1/account/verify-email"
        token={token ?? ''}
        label="Confirm my address"
        next={{ href: '/account', label: 'Go to your account', message: 'Thank you: your address is confirmed.' }}
      />
    </section>
  );
}
