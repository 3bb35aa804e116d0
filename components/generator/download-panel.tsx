'use client';

import Link from 'next/link';
import { useState } from 'react';
import type { PrinterProfile } from '@/lib/printer-profile';
import { describeScale } from '@/lib/printer-scale-text';
import type { FieldIssue, SheetRequest } from '@/lib/sheet/sheet-request';
import { usePrinterProfiles } from '@/components/printer-check/use-printer-profiles';
import { downloadSheet } from './download-sheet';
import { inputClass } from './fields';

type Status = { kind: 'idle' } | { kind: 'busy'; format: string } | { kind: 'saved'; fileName: string } | { kind: 'error'; error: string; issues: FieldIssue[] };

const NO_CORRECTION = '';

/** The printer profiles saved in the signed-in user's chosen workspace, and which one is its default. */
export type WorkspacePrinterProfiles = { workspaceName: string; profiles: PrinterProfile[]; defaultId: string | null };

/** Workspace profiles and browser profiles share one select: their ids are kept apart by a prefix. */
const workspaceOptionId = (id: string) => `workspace:${id}`;

/** The PDF is the main download; the SVG (for editors and cutters) is offered beside it. */
const FORMATS = [
  { format: 'pdf', className: 'bg-gauge-600 text-white shadow-sm hover:bg-gauge-700' },
  {
    format: 'svg',
    className:
      'border border-steel-300 bg-white text-steel-800 hover:bg-steel-100 dark:border-steel-600 dark:bg-steel-900 dark:text-steel-100 dark:hover:bg-steel-800',
  },
] as const;

/**
 * "Download PDF" / "Download SVG": validates the form (the same schema), adds the
 * chosen printer profile's correction and saves the API's answer.
 */
export function DownloadPanel({
  validate,
  workspace,
}: {
  validate: (onValid: (request: SheetRequest) => void, onInvalid: () => void) => Promise<void>;
  workspace?: WorkspacePrinterProfiles | null;
}) {
  const localProfiles = usePrinterProfiles();
  const workspaceProfiles = (workspace?.profiles ?? []).map((p) => ({ ...p, id: workspaceOptionId(p.id) }));
  const profiles = [...workspaceProfiles, ...localProfiles];
  const [chosenId, setChosenId] = useState<string | undefined>(undefined);
  const [status, setStatus] = useState<Status>({ kind: 'idle' });
  // Until the user chooses: the workspace's default profile, else the newest one kept in this browser (made for this printer).
  const workspaceDefault = workspace?.defaultId ? workspaceOptionId(workspace.defaultId) : undefined;
  const selectedId = chosenId ?? workspaceDefault ?? localProfiles[0]?.id ?? NO_CORRECTION;
  const profile = profiles.find((p) => p.id === selectedId);

  const download = (format: 'pdf' | 'svg') =>
    validate(async (request) => {
      setStatus({ kind: 'busy', format });
      const correction = profile
        ? { printerScaleX: profile.printerScaleX, printerScaleY: profile.printerScaleY, printerProfileName: profile.name }
        : { printerScaleX: 1, printerScaleY: 1, printerProfileName: undefined };
      const result = await downloadSheet({ ...request, ...correction, format });
      setStatus(result.ok ? { kind: 'saved', fileName: result.fileName } : { kind: 'error', error: result.error, issues: result.issues });
    }, () => setStatus({ kind: 'error', error: 'Some fields need attention first: see the messages beside them.', issues: [] }));

  return (
    <section aria-labelledby="download-heading" className="space-y-3 rounded-lg border border-steel-200 bg-white p-4 dark:border-steel-800 dark:bg-steel-900">
      <h2 id="download-heading" className="text-xs font-bold uppercase tracking-[0.14em] text-steel-600 dark:text-steel-300">
        Download
      </h2>
      <div className="space-y-1">
        <label htmlFor="printer-profile" className="block text-sm font-medium text-steel-800 dark:text-steel-200">
          Printer correction
        </label>
        <select id="printer-profile" value={selectedId} onChange={(e) => setChosenId(e.target.value)} className={inputClass} aria-describedby="printer-profile-help">
          <option value={NO_CORRECTION}>No correction</option>
          {workspace && workspaceProfiles.length > 0 ? (
            <optgroup label={workspace.workspaceName}>
              {workspaceProfiles.map((p) => (
                <option key={p.id} value={p.id}>
                  {p.name} ({describeScale(p)}){p.id === workspaceDefault ? ', workspace default' : ''}
                </option>
              ))}
            </optgroup>
          ) : null}
          {localProfiles.map((p) => (
            <option key={p.id} value={p.id}>
              {p.name} ({describeScale(p)})
            </option>
          ))}
        </select>
        <p id="printer-profile-help" className="text-xs text-steel-500 dark:text-steel-400">
          {profiles.length === 0 ? (
            <>
              No printer profile yet. <Link href="/printer-check" className="text-gauge-600 underline underline-offset-2">Check your printer</Link> to correct a
              printer that prints slightly large or small.
            </>
          ) : (
            'The sheet is pre-scaled so this printer prints it true to size; the title block names the profile.'
          )}
        </p>
      </div>
      <div className="flex flex-wrap gap-2">
        {FORMATS.map(({ format, className }) => (
          <button key={format} type="button" onClick={() => download(format)} disabled={status.kind === 'busy'} className={`min-h-11 rounded-md px-4 text-sm font-semibold disabled:opacity-60 ${className}`}>
            Download {format.toUpperCase()}
          </button>
        ))}
      </div>
      <div aria-live="polite" className="text-sm">
        {status.kind === 'busy' ? <p className="text-steel-500">Preparing the {status.format.toUpperCase()}…</p> : null}
        {status.kind === 'saved' ? <p className="text-steel-600 dark:text-steel-300">Saved {status.fileName}.</p> : null}
        {status.kind === 'error' ? (
          <div role="alert" className="rounded-md border border-red-200 bg-red-50 p-3 text-red-800 dark:border-red-900 dark:bg-red-950/40 dark:text-red-300">
            <p className="font-medium">{status.error}</p>
            {status.issues.length > 0 ? (
              <ul className="mt-1 list-disc pl-5 text-xs">
                {status.issues.map((issue) => (
                  // The message names the field by its label; the JSON path stays for API clients only.
                  <li key={`${issue.path}-${issue.message}`}>{issue.message}</li>
                ))}
              </ul>
            ) : null}
          </div>
        ) : null}
      </div>
    </section>
  );
}
