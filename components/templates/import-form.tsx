'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';

type Problem = { row: number; column: string; message: string };
type Match = { row: number; name: string; id: number; version: number };
type Answer = {
  error?: string;
  message?: string;
  preview?: boolean;
  matchingRows?: number;
  matches?: Match[];
  problems?: Problem[];
  problemCount?: number;
};

/**
 * Sends a CSV to the import route in two steps: "Check file" previews how many rows are new
 * and which match a template by name; "Import" then sends the file with the chosen handling of
 * those (skip or update, with the versions the preview saw) and an Idempotency-Key, so a retry
 * after a lost connection cannot import twice. Every problem is listed by row and column.
 */
export function ImportForm({ slug }: { slug: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [result, setResult] = useState<Answer>();
  const [checked, setChecked] = useState<{ file: File; matches: Match[]; key: string }>();
  const [onMatch, setOnMatch] = useState<'skip' | 'update'>('skip');

  const send = async (form: FormData, headers: Record<string, string> = {}): Promise<{ ok: boolean; answer: Answer }> => {
    setBusy(true);
    const res = await fetch(`/api/v1/workspaces/${slug}/templates/import`, { method: 'POST', body: form, headers }).catch(() => null);
    setBusy(false);
    if (!res) return { ok: false, answer: { error: 'The server could not be reached; nothing was imported. Try again.' } };
    return { ok: res.ok, answer: await res.json().catch(() => ({ error: `Import failed (HTTP ${res.status})` })) };
  };

  const onCheck = async (event: React.FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    const file = new FormData(event.currentTarget).get('file');
    if (!(file instanceof File)) return;
    const form = new FormData();
    form.set('file', file);
    form.set('preview', '1');
    const { ok, answer } = await send(form);
    setResult(answer);
    setChecked(ok ? { file, matches: answer.matches ?? [], key: crypto.randomUUID() } : undefined);
  };

  const onImport = async () => {
    if (!checked) return;
    const form = new FormData();
    form.set('file', checked.file);
    form.set('onMatch', onMatch);
    form.set('matchVersions', JSON.stringify(Object.fromEntries(checked.matches.map((m) => [m.id, m.version]))));
    const { ok, answer } = await send(form, { 'Idempotency-Key': checked.key });
    setResult(answer);
    if (ok) {
      setChecked(undefined);
      router.refresh();
    }
  };

  return (
    <div className="space-y-3">
      <form onSubmit={onCheck} aria-label="Import templates" className="flex flex-wrap items-end gap-3">
        <div className="space-y-1">
          <label htmlFor="import-file" className="block text-sm font-medium">
            CSV file
          </label>
          <input id="import-file" name="file" type="file" accept=".csv,.tsv,.txt,text/csv" required className="text-sm" onChange={() => setChecked(undefined)} />
        </div>
        <button type="submit" disabled={busy} className="rounded-md border border-gauge-600 px-4 py-2 text-sm font-semibold text-gauge-700 disabled:opacity-60 dark:text-gauge-300">
          {busy && !checked ? 'Checking…' : 'Check file'}
        </button>
      </form>
      {checked ? (
        <div className="space-y-2 rounded-md border border-steel-200 p-3 dark:border-steel-700">
          {checked.matches.length > 0 ? (
            <fieldset className="space-y-1 text-sm">
              <legend className="font-medium">Rows with the name of an existing template ({checked.matches.map((m) => m.name).slice(0, 5).join(', ')}{checked.matches.length > 5 ? ', …' : ''})</legend>
              <label className="flex items-center gap-2">
                <input type="radio" name="on-match" value="skip" checked={onMatch === 'skip'} onChange={() => setOnMatch('skip')} /> Skip those rows
              </label>
              <label className="flex items-center gap-2">
                <input type="radio" name="on-match" value="update" checked={onMatch === 'update'} onChange={() => setOnMatch('update')} /> Update those templates from the file (recorded in their history)
              </label>
            </fieldset>
          ) : null}
          <button type="button" onClick={onImport} disabled={busy} className="rounded-md bg-gauge-600 px-4 py-2 text-sm font-semibold text-white disabled:opacity-60">
            {busy ? 'Importing…' : 'Import'}
          </button>
        </div>
      ) : null}
      <div role="status" aria-live="polite" className="text-sm">
        {result?.message ? <p>{result.message}</p> : null}
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
