import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { currentUser } from '@/app/lib/authz';
import { SignInForm } from '@/components/account/sign-in-form';
import { safeCallbackPath } from '@/lib/safe-callback';

export const metadata: Metadata = { title: 'Sign in' };

type Props = { searchParams: Promise<{ callbackUrl?: string; error?: string }> };

export default async function SignInPage({ searchParams }: Props) {
  const { callbackUrl, error } = await searchParams;
  const target = safeCallbackPath(callbackUrl);
  if (await currentUser()) redirect(target);
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Sign in</h1>
      <p className="text-sm text-steel-600 dark:text-steel-300">
        The sheet maker and calculators work without an account; signing in keeps templates, build sheets and printer profiles for you
        or your shop.
      </p>
      <SignInForm callbackUrl={target} initialError={error} />
      <p className="text-sm">
        No account yet?{' '}
        <Link href={`/sign-up?callbackUrl=${encodeURIComponent(target)}`} className="text-gauge-700 underline dark:text-gauge-300">
          Create one
        </Link>
      </p>
    </section>
  );
}
