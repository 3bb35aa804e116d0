import Link from 'next/link';
import type { Build } from '@/lib/builds/build';
import { buildSheetKinds, buildSheetRequest } from '@/lib/builds/build-sheet';
import { generatorHref } from '@/lib/templates/generator-href';
import type { Template } from '@/lib/templates/template';
import type { TemplateSheetKind } from '@/lib/templates/template-sheet';

const KIND_LABELS: Record<TemplateSheetKind, string> = { wheel: 'degree wheel', ring: 'flange ring', strip: 'rim strip' };

/** Open the sheet maker filled from the record: its template's diameters, the timing set as the mark, the TDC correction as the note. */
export function BuildPrintLinks({ template, build }: { template: Template | null; build: Build }) {
  if (!template) return <p className="text-sm text-steel-600">Choose the template this engine was built from to print its sheets from here.</p>;
  const kinds = buildSheetKinds(template);
  if (kinds.length === 0) return <p className="text-sm text-steel-600">The template has no flywheel diameters yet: add them to print from this record.</p>;
  return (
    <ul className="flex flex-wrap gap-3">
      {kinds.map((kind) => (
        <li key={kind}>
          <Link href={generatorHref(buildSheetRequest(template, build, kind)!)} className="rounded-md bg-spark-500 px-3 py-1.5 text-sm font-semibold text-steel-950 hover:bg-spark-400">
            Print a {KIND_LABELS[kind]} for this engine
          </Link>
        </li>
      ))}
    </ul>
  );
}
