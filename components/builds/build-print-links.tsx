import Link from 'next/link';
import type { Build } from '@/lib/builds/build';
import { buildSheetKinds, buildSheetRequest } from '@/lib/builds/build-sheet';
import { generatorHref } from '@/lib/templates/generator-href';
import type { Template } from '@/lib/templates/template';
import type { TemplateSheetKind } from '@/lib/templates/template-sheet';

const KIND_LABELS: Record<TemplateSheetKind, string> = { wheel: 'degree wheel', ring: 'flange ring', strip: 'rim strip' };

/** Open the sheet maker filled from the record: its template's diameters, the timing set as the mark, the TDC correction as the note. */
type Props = { template: Template | null; build: Build; sheetUrl: string; profileName: string | null; workspaceSlug: string };

export function BuildPrintLinks({ template, build, sheetUrl, profileName, workspaceSlug }: Props) {
  if (!template) return <p className="text-sm text-steel-600">Choose the template this engine was built from to print its sheets from here.</p>;
  const kinds = buildSheetKinds(template);
  if (kinds.length === 0) return <p className="text-sm text-steel-600">The template has no flywheel diameters yet: add them to print from this record.</p>;
  return (
    <div className="space-y-2">
      <ul className="space-y-2">
        {kinds.map((kind) => (
          <li key={kind} className="flex flex-wrap items-center gap-3 text-sm">
            <Link href={`${generatorHref(buildSheetRequest(template, build, kind)!)}&workspace=${workspaceSlug}`} className="rounded-md bg-spark-500 px-3 py-1.5 font-semibold text-steel-950 hover:bg-spark-400">
              Print a {KIND_LABELS[kind]} for this engine
            </Link>
            <a href={`${sheetUrl}?kind=${kind}&format=pdf`} className="text-gauge-700 underline dark:text-gauge-300">
              {KIND_LABELS[kind]} PDF
            </a>
            {profileName ? (
              <a href={`${sheetUrl}?kind=${kind}&format=pdf&profile=none`} className="text-gauge-700 underline dark:text-gauge-300">
                {KIND_LABELS[kind]} PDF without correction
              </a>
            ) : null}
          </li>
        ))}
      </ul>
      <p className="text-xs text-steel-500">
        {profileName ? `The PDFs are corrected for the workspace’s printer profile “${profileName}”; the sheet’s title block names it.` : 'The workspace has no default printer profile: the PDFs are not corrected.'}
      </p>
    </div>
  );
}
