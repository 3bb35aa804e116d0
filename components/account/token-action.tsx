'use client';

import Link from 'next/link';
import { useState } from 'react';
import { FormMessage } from './form-controls';
import { submitJson } from './submit-json';

type Props = {
  endpoint: string;
  token: string;
  label: string;
  /** What to say and where to go after success; `{key}` is replaced by that field of the JSON answer. */
  next: { href: string; label: string; message: string };
};

function fill(template: string, body: Record<string, unknown>): string {
  return template.replace(/\{(\w+)\}/g, (_, key: string) => String(body[key] ?? ''));
}

/**
 * One button that spends a mailed link's token. A button, not the page load itself, so
 * mail scanners that open links do not use the token up.
 */
export function TokenAction({ endpoint, token, label, next }: Props) {
  const [state, setState] = useState<{ ok: boolean; message: string; href?: string; linkLabel?: string } | undefined>();
  const [busy, setBusy] = useState(false);

  const run = async () => {
    setBusy(true);
    const result = await submitJson(endpoint, 'POST', { token });
    setBusy(false);
    if (!result.ok) {
      setState({ ok: false, message: typeof result.body.error === 'string' ? result.body.error : `Failed (HTTP ${result.status})` });
      return;
    }
    setState({ ok: true, message: fill(next.message, result.body), href: fill(next.href, result.body), linkLabel: fill(next.label, result.body) });
  };

  return (
    <div className="space-y-3">
      {state?.ok ? null : (
        <button
          type="button"
          onClick={run}
          disabled={busy}
          className="min-h-11 rounded-md bg-gauge-600 px-4 text-sm font-semibold text-white shadow-sm hover:bg-gauge-700 disabled:opacity-60"
        >
          {label}
        </button>
      )}
      <FormMessage tone={state && !state.ok ? 'error' : 'info'} message={state?.message} />
      {state?.href ? (
        // A full load, so the header's workspace switcher shows a workspace just joined.
        <a href={state.href} className="text-sm font-semibold text-gauge-700 underline dark:text-gauge-300">
          {state.linkLabel}
        </a>
      ) : null}
      {state && !state.ok ? (
        <Link href="/account" className="block text-sm text-gauge-700 underline dark:text-gauge-300">
          Back to your account
        </Link>
      ) : null}
    </div>
  );
}
