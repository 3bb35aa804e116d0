import type { Metadata } from 'next';
import Link from 'next/link';
import { pageUser } from '@/app/lib/page-access';
import { SignOutEverywhere } from '@/components/account/sign-out-everywhere';
import { ShopNameForm } from '@/components/workspace/create-shop-form';
import { ResendVerification } from '@/components/workspace/resend-verification';
import { findUserById, workspacesOf } from '@/db/accounts';

export const metadata: Metadata = { title: 'Your account' };
export const dynamic = 'force-dynamic';

export default async function AccountPage() {
  const user = await pageUser('/account');
  const [row, workspaces] = await Promise.all([findUserById(user.id), workspacesOf(user.id)]);
  return (
    <section className="space-y-8">
      <div className="space-y-1">
        <h1 className="text-2xl font-bold">Your account</h1>
        <p className="text-sm text-steel-600 dark:text-steel-300">
          {user.name} · {user.email} · {row?.email_verified_at ? 'address confirmed' : 'address not confirmed yet'}
        </p>
        {row?.email_verified_at ? null : <ResendVerification />}
      </div>
      <div className="space-y-2">
        <h2 className="text-lg font-semibold">Workspaces</h2>
        <ul className="space-y-1 text-sm">
          {workspaces.map((w) => (
            <li key={w.id}>
              <Link href={`/w/${w.slug}`} className="font-medium text-gauge-700 underline dark:text-gauge-300">
                {w.name}
              </Link>{' '}
              <span className="text-steel-500">({w.kind === 'personal' ? 'personal' : 'shop'}, {w.role})</span>
            </li>
          ))}
        </ul>
      </div>
      <div className="space-y-2">
        <h2 className="text-lg font-semibold">Create a shop workspace</h2>
        <p className="text-sm text-steel-600 dark:text-steel-300">A shop shares its template library and build sheets with the people you invite.</p>
        <ShopNameForm />
      </div>
      <div className="space-y-2">
        <h2 className="text-lg font-semibold">Sessions</h2>
        <p className="text-sm text-steel-600 dark:text-steel-300">
          Signing out ends your sessions on every device. Use this if you signed in on a computer you no longer use or lost a phone.
        </p>
        <SignOutEverywhere />
      </div>
    </section>
  );
}
