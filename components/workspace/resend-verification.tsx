'use client';

import { useState } from 'react';
import { FormMessage } from '@/components/account/form-controls';
import { submitJson } from '@/components/account/submit-json';

export function ResendVerification() {
  const [message, setMessage] = useState<string | undefined>();
  return (
    <div className="space-y-2">
      <button
        type="button"
        className="min-h-11 rounded-md border border-steel-300 px-3 text-sm hover:bg-steel-100 dark:border-steel-600 dark:hover:bg-steel-800"
        onClick={async () => {
          const result = await submitJson('/api/v1/account/verify-email/resend', 'POST');
          setMessage(result.ok ? 'A new confirmation link is on its way (valid for 24 hours).' : String(result.body.error));
        }}
      >
        Send a new confirmation link
      </button>
      <FormMessage message={message} />
    </div>
  );
}
