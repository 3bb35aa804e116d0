'use client';

import { useRouter } from 'next/navigation';
import { submitJson } from '@/components/account/submit-json';

/** `expiresOn` is written by the page in the reader's date format (lib/format/date-format.ts). */
type Pending = { id: number; email: string; role: string; expiresOn: string };

export function PendingInvitations({ slug, invitations }: { slug: string; invitations: Pending[] }) {
  const router = useRouter();
  if (invitations.length === 0) return <p className="text-sm text-steel-500">No invitations waiting.</p>;
  return (
    <ul className="space-y-1 text-sm">
      {invitations.map((inv) => (
        <li key={inv.id} className="flex items-center gap-3">
          <span>
            {inv.email} as {inv.role}, until {inv.expiresOn}
          </span>
          <button
            type="button"
            className="text-red-700 underline dark:text-red-400"
            onClick={async () => {
              await submitJson(`/api/v1/workspaces/${slug}/invitations/${inv.id}`, 'DELETE');
              router.refresh();
            }}
          >
            Withdraw
          </button>
        </li>
      ))}
    </ul>
  );
}
