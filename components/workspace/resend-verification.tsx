'use client';

import { RequestButton } from '@/components/account/request-button';

export function ResendVerification() {
  return (
    <RequestButton
      url="/api/v1/account/verify-email/resend"
      label="Send a new confirmation link"
      outcome={(result) => (result.ok ? 'A new confirmation link is on its way (valid for 24 hours).' : String(result.body.error))}
    />
  );
}
