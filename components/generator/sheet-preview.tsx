'use client';

import { useEffect, useRef, useState } from 'react';
import { previewSheet } from '@/app/actions/sheet-preview';
import type { SheetRequestInput } from '@/lib/sheet/sheet-request';
import type { GeneratorFormValues } from './form-values';
import type { PreviewIssue } from './sheet-checks';

const DEBOUNCE_MS = 250;

type SheetChecks = typeof import('./sheet-checks');
let sheetChecks: SheetChecks | undefined;

/** The browser's check with the shared schema (and zod with it), loaded on first need rather than with the page. */
async function loadSheetChecks(): Promise<SheetChecks> {
  sheetChecks ??= await import('./sheet-checks');
  return sheetChecks;
}
type ReadyPreview = { svg: string; warnings: string[]; pageCount: number; joinPieces: boolean; widthMm: number; heightMm: number };
type PreviewState =
  | { status: 'idle' }
  | ({ status: 'ready' } & ReadyPreview)
  | { status: 'invalid'; issues: PreviewIssue[] }
  | { status: 'failed'; message: string };

/** The drawing's size from the root's width/height attributes ("123.4mm"). */
export function svgSizeMm(svg: string): { widthMm: number; heightMm: number } {
  const root = /<svg\b[^>]*>/.exec(svg)?.[0] ?? '';
  const read = (attr: string) => Number(new RegExp(`\\s${attr}="([\\d.]+)mm"`).exec(root)?.[1] ?? Number.NaN);
  const widthMm = read('width');
  const heightMm = read('height');
  return Number.isFinite(widthMm) && Number.isFinite(heightMm) && widthMm > 0 && heightMm > 0 ? { widthMm, heightMm } : { widthMm: 210, heightMm: 297 };
}

function describePages(pageCount: number, paper: string, orientation: string, joinPieces: boolean): string {
  if (pageCount <= 1) return `Prints on one page of ${paper} ${orientation}.${joinPieces ? ' Cut out the pieces and join them at the marks.' : ''}`;
  return `Prints on ${pageCount} pages of ${paper} ${orientation}${joinPieces ? '; join the pieces at the marks' : ''}.`;
}

const KIND_NAMES: Record<string, string> = { wheel: 'degree wheel', ring: 'flange ring', strip: 'rim strip', scribe: 'scribe chart', check: 'scale check' };

/** The preview's accessible name: what the drawing is, its size and its pages, since the SVG itself says nothing to a screen reader. */
function previewName(request: SheetRequestInput, preview: ReadyPreview): string {
  const what = KIND_NAMES[request.kind ?? 'wheel'] ?? 'sheet';
  const title = request.title?.trim() ? ` “${request.title.trim()}”` : '';
  return `Preview of the ${what}${title}, ${preview.widthMm.toFixed(1)} by ${preview.heightMm.toFixed(1)} mm, ${preview.pageCount === 1 ? 'one page' : `${preview.pageCount} pages`}`;
}

/**
 * A true-proportion preview that follows the form: the request is debounced,
 * checked with the shared schema in the browser, then drawn by the server action.
 * The first drawing, of the values the page was served with, goes to the server
 * straight away (it checks with the same schema), so the page needs no schema to
 * show it; the browser's check then names the issues in the form's length unit.
 * Late answers to earlier requests are dropped.
 */
export function SheetPreview({
  request,
  formValues,
}: {
  request: SheetRequestInput;
  /** The whole form: length ranges in issues are restated in the unit it shows lengths in. */
  formValues: GeneratorFormValues;
}) {
  const [state, setState] = useState<PreviewState>({ status: 'idle' });
  const [busy, setBusy] = useState(false);
  // While the fields are being corrected the last good drawing stays on screen, dimmed.
  const [lastGood, setLastGood] = useState<ReadyPreview | undefined>(undefined);
  const sequence = useRef(0);
  const requestKey = JSON.stringify(request);
  const servedKey = useRef(requestKey);

  useEffect(() => {
    const ticket = ++sequence.current;
    const timer = setTimeout(async () => {
      const input = JSON.parse(requestKey) as SheetRequestInput;
      try {
        if (requestKey !== servedKey.current) {
          const issues = (await loadSheetChecks()).previewIssues(input);
          if (ticket !== sequence.current) return;
          if (issues) {
            setState({ status: 'invalid', issues });
            return;
          }
        }
        setBusy(true);
        const answer = await previewSheet({ ...input, format: 'svg' });
        if (ticket !== sequence.current) return;
        if (answer.ok) {
          const ready = { svg: answer.svg, warnings: answer.warnings, pageCount: answer.pageCount, joinPieces: answer.joinPieces, ...svgSizeMm(answer.svg) };
          setState({ status: 'ready', ...ready });
          setLastGood(ready);
        } else {
          const issues = (await loadSheetChecks()).previewIssues(input) ?? answer.issues;
          if (ticket === sequence.current) setState({ status: 'invalid', issues });
        }
      } catch {
        if (ticket === sequence.current) setState({ status: 'failed', message: 'The preview could not be drawn. The downloads may still work; try again.' });
      } finally {
        if (ticket === sequence.current) setBusy(false);
      }
    }, DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [requestKey]);

  const paper = request.paper ?? 'A4';
  const orientation = request.orientation ?? 'portrait';
  const last = state.status === 'ready' ? state : undefined;

  return (
    <section aria-labelledby="preview-heading" className="space-y-3">
      <div className="flex items-baseline justify-between gap-3">
        <h2 id="preview-heading" className="text-xs font-bold uppercase tracking-[0.14em] text-steel-600 dark:text-steel-300">
          Preview · true proportion
        </h2>
        <span className="font-mono text-xs text-steel-500" aria-live="polite">
          {busy ? 'drawing…' : last ? `${last.widthMm.toFixed(1)} × ${last.heightMm.toFixed(1)} mm` : ''}
        </span>
      </div>

      <PaperBox preview={state.status === 'ready' ? state : lastGood} stale={state.status !== 'ready'} request={request} />

      <div aria-live="polite" className="space-y-2 text-sm">
        {state.status === 'ready' ? (
          <p data-testid="page-count" className="font-medium text-steel-800 dark:text-steel-200">
            {describePages(state.pageCount, paper, orientation, state.joinPieces)}
          </p>
        ) : null}
        {state.status === 'invalid' ? (
          <div className="rounded-md border border-red-200 bg-red-50 p-3 text-red-800 dark:border-red-900 dark:bg-red-950/40 dark:text-red-300">
            <p className="font-medium">The preview waits for these fields:</p>
            <ul className="mt-1 list-disc pl-5 text-xs">
              {state.issues.map((issue) => (
                <li key={`${issue.path}-${issue.message}`}>{issue.code && sheetChecks ? sheetChecks.issueInFormUnit({ ...issue, code: issue.code }, formValues) : issue.message}</li>
              ))}
            </ul>
          </div>
        ) : null}
        {state.status === 'failed' ? <p className="text-red-700 dark:text-red-400">{state.message}</p> : null}
        {state.status === 'ready' && state.warnings.length > 0 ? (
          <div className="rounded-md border border-spark-400/60 bg-spark-400/10 p-3 text-steel-800 dark:text-steel-200">
            <p className="text-xs font-bold uppercase tracking-wider text-spark-700 dark:text-spark-400">Layout notes</p>
            <ul data-testid="layout-warnings" className="mt-1 list-disc space-y-0.5 pl-5 text-xs">
              {state.warnings.map((warning) => (
                <li key={warning}>{warning}</li>
              ))}
            </ul>
          </div>
        ) : null}
      </div>
    </section>
  );
}

function PaperBox({ preview, stale, request }: { preview?: ReadyPreview; stale: boolean; request: SheetRequestInput }) {
  if (!preview)
    return (
      <div className="sheet-paper flex aspect-[210/297] max-h-[70vh] w-full items-center justify-center rounded-sm border border-steel-300 text-sm text-steel-400 shadow-sm">
        Drawing the preview…
      </div>
    );
  const ratio = preview.widthMm / preview.heightMm;
  return (
    <div className="flex justify-center">
      <div
        data-testid="sheet-preview"
        role="img"
        aria-label={`${previewName(request, preview)}${stale ? ' (out of date while the fields are corrected)' : ''}`}
        data-stale={stale ? 'true' : undefined}
        className={`sheet-paper overflow-hidden rounded-sm border border-steel-300 shadow-[0_1px_0_#cfd6da,0_8px_24px_-12px_rgba(16,20,23,0.35)] transition-opacity [&>svg]:block [&>svg]:h-auto [&>svg]:w-full ${stale ? 'opacity-35' : ''}`}
        style={{ width: `min(100%, calc(70vh * ${ratio.toFixed(5)}))` }}
        // The SVG comes from our own renderer, which escapes every text it draws.
        dangerouslySetInnerHTML={{ __html: preview.svg }}
      />
    </div>
  );
}
