import type { Metadata } from 'next';
import Link from 'next/link';
import { SignUpForm } from '@/components/account/sign-up-form';
import { safeCallbackPath } from '@/lib/safe-callback';

export const metadata: Metadata = { title: 'Create an account' };

type Props = { searchParams: Promise<{ callbackUrl?: string; invitation?: string; email?: string }> };

export default async function SignUpPage({ searchParams }: Props) {
  const { callbackUrl, invitation, email } = await searchParams;
  const target = safeCallbackPath(callbackUrl);
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Create an account</h1>
      <p className="text-sm text-steel-600 dark:text-steel-300">
        You get a personal workspace for your own engines; you can create a shop workspace or join one by invitation later.
      </p>
      <SignUpForm callbackUrl={target} invitationToken={invitation} email={email} />
      <p className="text-sm">
        Already have an account?{' '}
        <Link href={`/sign-in?callbackUrl=${encodeURIComponent(target)}`} className="text-gauge-700 underline dark:text-gauge-300">
          Sign in
        </Link>
      </p>
    </section>
  );
}
