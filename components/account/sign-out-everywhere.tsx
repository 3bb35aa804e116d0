'use client';

import { signOut } from 'next-auth/react';
import { RequestButton } from '@/components/account/request-button';

/** Ends the account's sessions on every device (a lost phone, a shared shop computer), then this one. */
export function SignOutEverywhere() {
  return (
    <RequestButton
      url="/api/v1/account/sign-out-everywhere"
      label="Sign out everywhere"
      outcome={async (result) => {
        if (!result.ok) return String(result.body.error);
        await signOut({ callbackUrl: '/sign-in' });
        return undefined;
      }}
    />
  );
}
