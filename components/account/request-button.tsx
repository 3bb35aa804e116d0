'use client';

import { useState } from 'react';
import { FormMessage } from '@/components/account/form-controls';
import { submitJson, type JsonResult } from '@/components/account/submit-json';

type RequestButtonProps = {
  url: string;
  label: string;
  /** What to say about the answer (undefined: nothing, e.g. when it moves on to another page). */
  outcome: (result: JsonResult) => string | undefined | Promise<string | undefined>;
};

/** A button that POSTs to `url` and shows the message its `outcome` makes of the answer. */
export function RequestButton({ url, label, outcome }: RequestButtonProps) {
  const [message, setMessage] = useState<string | undefined>();
  return (
    <div className="space-y-2">
      <button
        type="button"
        className="rounded-md border border-steel-300 px-3 py-1.5 text-sm hover:bg-steel-100 dark:border-steel-600 dark:hover:bg-steel-800"
        onClick={async () => setMessage(await outcome(await submitJson(url, 'POST')))}
      >
        {label}
      </button>
      <FormMessage message={message} />
    </div>
  );
}
