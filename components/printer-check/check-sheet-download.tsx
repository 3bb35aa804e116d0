'use client';

import { useState } from 'react';
import { PAPER_NAMES, type PaperName } from '@/lib/sheet/paper';
import { downloadSheet, type DownloadResult } from '@/components/generator/download-sheet';
import { inputClass } from '@/components/generator/fields';

/** Step 1 of the printer check: the scale-check sheet (kind "check") on the user's paper. */
export function CheckSheetDownload() {
  const [paper, setPaper] = useState<PaperName>('A4');
  const [orientation, setOrientation] = useState<'portrait' | 'landscape'>('portrait');
  const [result, setResult] = useState<DownloadResult | 'busy' | undefined>(undefined);

  const download = async () => {
    setResult('busy');
    setResult(await downloadSheet({ kind: 'check', paper, orientation, title: 'Printer check', format: 'pdf' }));
  };

  return (
    <div className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-2">
        <div className="space-y-1">
          <label htmlFor="check-paper" className="block text-sm font-medium text-steel-800 dark:text-steel-200">
            Paper
          </label>
          <select id="check-paper" value={paper} onChange={(e) => setPaper(e.target.value as PaperName)} className={inputClass}>
            {PAPER_NAMES.map((name) => (
              <option key={name} value={name}>
                {name}
              </option>
            ))}
          </select>
        </div>
        <div className="space-y-1">
          <label htmlFor="check-orientation" className="block text-sm font-medium text-steel-800 dark:text-steel-200">
            Orientation
          </label>
          <select
            id="check-orientation"
            value={orientation}
            onChange={(e) => setOrientation(e.target.value as 'portrait' | 'landscape')}
            className={inputClass}
          >
            <option value="portrait">Portrait</option>
            <option value="landscape">Landscape</option>
          </select>
        </div>
      </div>
      <button
        type="button"
        onClick={download}
        disabled={result === 'busy'}
        className="min-h-11 rounded-md bg-gauge-600 px-4 text-sm font-semibold text-white shadow-sm hover:bg-gauge-700 disabled:opacity-60"
      >
        Download the scale check sheet (PDF)
      </button>
      <div aria-live="polite" className="text-sm">
        {result === 'busy' ? <p className="text-steel-500">Preparing the PDF…</p> : null}
        {result && result !== 'busy' && result.ok ? <p className="text-steel-600 dark:text-steel-300">Saved {result.fileName}.</p> : null}
        {result && result !== 'busy' && !result.ok ? (
          <div role="alert" className="text-red-700 dark:text-red-400">
            <p>{result.error}</p>
            <ul className="list-disc pl-5 text-xs">
              {result.issues.map((issue) => (
                <li key={issue.path + issue.message}>{issue.message}</li>
              ))}
            </ul>
          </div>
        ) : null}
      </div>
    </div>
  );
}
