'use client';

import { signOut } from 'next-auth/react';
import { useState } from 'react';
import { FormMessage } from '@/components/account/form-controls';
import { submitJson } from '@/components/account/submit-json';

/** Ends the account's sessions on every device (a lost phone, a shared shop computer), then this one. */
export function SignOutEverywhere() {
  const [message, setMessage] = useState<string | undefined>();
  return (
    <div className="space-y-2">
      <button
        type="button"
        className="rounded-md border border-steel-300 px-3 py-1.5 text-sm hover:bg-steel-100 dark:border-steel-600 dark:hover:bg-steel-800"
        onClick={async () => {
          const result = await submitJson('/api/v1/account/sign-out-everywhere', 'POST');
          if (!result.ok) return setMessage(String(result.body.error));
          await signOut({ callbackUrl: '/sign-in' });
        }}
      >
        Sign out everywhere
      </button>
      <FormMessage message={message} />
    </div>
  );
}
