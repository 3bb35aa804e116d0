import type { Metadata } from 'next';
import Link from 'next/link';
import { currentUser } from '@/app/lib/authz';
import { TOKEN_REFUSAL_MESSAGES } from '@/lib/one-time-token';
import { TokenAction } from '@/components/account/token-action';
import { lookUpInvitation } from '@/db/invitations';

export const metadata: Metadata = { title: 'Accept an invitation' };
export const dynamic = 'force-dynamic';

type Props = { searchParams: Promise<{ token?: string }> };

export default async function AcceptInvitationPage({ searchParams }: Props) {
  const { token = '' } = await searchParams;
  const looked = /^[A-Za-z0-9_-]{20,100}$/.test(token) ? await lookUpInvitation(token) : ({ ok: false, reason: 'unknown' } as const);
  if (!looked.ok) {
    return (
      <section className="space-y-4">
        <h1 className="text-2xl font-bold">Accept an invitation</h1>
        <p role="alert" className="text-sm font-medium text-red-700 dark:text-red-400">
          {TOKEN_REFUSAL_MESSAGES[looked.reason]} Ask the shop owner to invite you again.
        </p>
      </section>
    );
  }
  const { invitation } = looked;
  const user = await currentUser();
  const back = `/invitations/accept?token=${token}`;
  return (
    <section className="space-y-4">
      <h1 className="text-2xl font-bold">Join {invitation.workspaceName}</h1>
      <p className="text-sm text-steel-700 dark:text-steel-200">
        You are invited as <strong>{invitation.role}</strong>. The invitation is for <strong>{invitation.email}</strong>.
      </p>
      {!user ? (
        <div className="space-y-2 text-sm">
          <p>Sign in with that address, or create an account for it, and you come back here to accept.</p>
          <p className="flex gap-4">
            <Link href={`/sign-in?callbackUrl=${encodeURIComponent(back)}`} className="font-semibold text-gauge-700 underline dark:text-gauge-300">
              Sign in
            </Link>
            <Link
              href={`/sign-up?callbackUrl=${encodeURIComponent(back)}&invitation=${token}&email=${encodeURIComponent(invitation.email)}`}
              className="font-semibold text-gauge-700 underline dark:text-gauge-300"
            >
              Create an account
            </Link>
          </p>
        </div>
      ) : user.email !== invitation.email ? (
        <p role="alert" className="text-sm font-medium text-red-700 dark:text-red-400">
          You are signed in as {user.email}, but this invitation is for {invitation.email}. Sign out and sign in with that address.
        </p>
      ) : (
        <TokenAction
          endpoint="/api/v1/invitations/accept"
          token={token}
          label={`Join ${invitation.workspaceName}`}
          next={{
            href: '/w/{workspaceSlug}',
            label: `Open ${invitation.workspaceName}`,
            message: `You are now a member of ${invitation.workspaceName} as {role}.`,
          }}
        />
      )}
    </section>
  );
}
