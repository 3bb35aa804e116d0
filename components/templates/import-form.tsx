'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';

type Problem = { row: number; column: string; message: string };

/** Sends a CSV to the import route and lists every problem (row, column, message) if it refuses. */
export function ImportForm({ slug }: { slug: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<{ error?: string; imported?: number; problems?: Problem[]; problemCount?: number }>();

  const onSubmit = async (event: React.FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setBusy(true);
    const res = await fetch(`/api/v1/workspaces/${slug}/templates/import`, { method: 'POST', body: new FormData(event.currentTarget) }).catch(() => null);
    setBusy(false);
    if (!res) return setResult({ error: 'The server could not be reached' });
    setResult(await res.json().catch(() => ({ error: `Import failed (HTTP ${res.status})` })));
    if (res.ok) router.refresh();
  };

  return (
    <div className="space-y-3">
      <form onSubmit={onSubmit} aria-label="Import templates" className="flex flex-wrap items-end gap-3">
        <div className="space-y-1">
          <label htmlFor="import-file" className="block text-sm font-medium">
            CSV file
          </label>
          <input id="import-file" name="file" type="file" accept=".csv,text/csv" required className="text-sm" />
        </div>
        <button type="submit" disabled={busy} className="rounded-md bg-gauge-600 px-4 py-2 text-sm font-semibold text-white disabled:opacity-60">
          {busy ? 'Checking and importing…' : 'Import'}
        </button>
      </form>
      <div role="status" aria-live="polite" className="text-sm">
        {result?.imported !== undefined ? <p>Imported {result.imported} templates.</p> : null}
        {result?.error ? <p className="font-medium text-red-700 dark:text-red-400">{result.error}</p> : null}
      </div>
      {result?.problems?.length ? (
        <table className="text-sm">
          <caption className="text-left text-xs text-steel-500">
            {result.problemCount && result.problemCount > result.problems.length ? `First ${result.problems.length} of ${result.problemCount} problems` : 'Problems'}
          </caption>
          <thead>
            <tr className="text-left">
              <th scope="col" className="pr-4">Row</th>
              <th scope="col" className="pr-4">Column</th>
              <th scope="col">Problem</th>
            </tr>
          </thead>
          <tbody>
            {result.problems.map((p, i) => (
              <tr key={i} className="border-t border-steel-100 align-top">
                <td className="pr-4 font-mono">{p.row}</td>
                <td className="pr-4 font-mono">{p.column}</td>
                <td>{p.message}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );
}
