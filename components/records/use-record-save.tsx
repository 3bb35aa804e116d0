'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import type { FieldValues, UseFormSetError } from 'react-hook-form';
import { applyIssues, submitJson } from '@/components/account/submit-json';

type Outcome = { tone: 'info' | 'error'; message: string; conflict?: boolean };

/**
 * Saving a versioned record (a template, a build record) from its form: a new one is POSTed to
 * `collectionUrl`, an edit PATCHed to its own URL with the version it was loaded at. A 409 keeps
 * every typed value and offers the current version (`ConflictLink`); field issues go to their fields;
 * a saved record opens its page. The API answers the record under `answerKey`.
 */
export function useRecordSave<T extends FieldValues>({
  collectionUrl,
  record,
  answerKey,
  pageOf,
  setError,
}: {
  collectionUrl: string;
  record: { id: number; version: number } | null;
  answerKey: 'template' | 'build';
  pageOf: (id: number) => string;
  setError: UseFormSetError<T>;
}) {
  const router = useRouter();
  const [outcome, setOutcome] = useState<Outcome>();
  const save = async (values: { version?: number | undefined } & Record<string, unknown>) => {
    const { version, ...fields } = values;
    const result = record
      ? await submitJson(`${collectionUrl}/${record.id}`, 'PATCH', { ...fields, version: version ?? record.version })
      : await submitJson(collectionUrl, 'POST', fields);
    if (result.status === 409) return setOutcome({ tone: 'error', message: String(result.body.error), conflict: true });
    if (!result.ok) return setOutcome({ tone: 'error', message: applyIssues(result, setError) });
    const saved = result.body[answerKey] as { id: number };
    router.push(pageOf(saved.id));
    router.refresh();
  };
  return { outcome, save };
}

/** After a refused save (409): the record as it is now, in a new tab, so the edits stay in the form. */
export function ConflictLink({ outcome, href }: { outcome: Outcome | undefined; href: string }) {
  if (!outcome?.conflict) return null;
  return (
    <a href={href} target="_blank" rel="noreferrer" className="text-sm text-gauge-700 underline">
      Open the current version (your edits stay here)
    </a>
  );
}
