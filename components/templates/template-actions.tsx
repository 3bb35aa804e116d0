'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { submitJson } from '@/components/account/submit-json';
import { ConfirmDialog, type ConfirmText } from '@/components/shell/confirm-dialog';

type ActionButtonProps = {
  url: string;
  body?: unknown;
  method?: string;
  label: string;
  busyLabel: string;
  /** A consequential action asks first, naming what will happen. */
  confirm?: ConfirmText & { danger?: boolean };
  after?: string;
};

/** A button that sends one JSON request, then refreshes the page (or goes to `after`); errors read out. */
export function ActionButton({ url, body, method = 'POST', label, busyLabel, confirm, after }: ActionButtonProps) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [asking, setAsking] = useState(false);
  const [error, setError] = useState('');
  const run = async () => {
    setBusy(true);
    setError('');
    const result = await submitJson(url, method, body);
    setBusy(false);
    setAsking(false);
    if (!result.ok) return setError(typeof result.body.error === 'string' ? result.body.error : `Failed (HTTP ${result.status})`);
    if (after) router.push(after);
    router.refresh();
  };
  return (
    <span className="inline-flex flex-col">
      <button
        type="button"
        onClick={() => (confirm ? setAsking(true) : void run())}
        disabled={busy}
        className="min-h-11 rounded-md border border-steel-300 px-3 text-sm font-medium hover:bg-steel-100 disabled:opacity-60 dark:border-steel-600 dark:hover:bg-steel-800"
      >
        {busy ? busyLabel : label}
      </button>
      <span role="alert" aria-live="polite" className="text-xs text-red-700 empty:hidden dark:text-red-400">
        {error}
      </span>
      {confirm ? <ConfirmDialog {...confirm} open={asking} busy={busy} onConfirm={() => void run()} onCancel={() => setAsking(false)} /> : null}
    </span>
  );
}
