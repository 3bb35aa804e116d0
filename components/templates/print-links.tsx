import Link from 'next/link';
import { generatorHref } from '@/lib/templates/generator-href';
import { availableSheetKinds, templateSheetRequest, type TemplateSheetKind } from '@/lib/templates/template-sheet';
import type { Template } from '@/lib/templates/template';

const KIND_LABELS: Record<TemplateSheetKind, string> = {
  wheel: 'degree wheel',
  ring: 'flange ring',
  strip: 'rim strip',
};

/** One row per sheet the template's diameters allow: open it in the sheet maker, or download PDF / SVG directly. */
export function PrintLinks({ template, sheetUrl, workspaceSlug }: { template: Template; sheetUrl: string; workspaceSlug?: string }) {
  const kinds = availableSheetKinds(template);
  if (kinds.length === 0)
    return <p className="text-sm text-steel-600">Add a flywheel face or rim diameter to print from this template.</p>;
  return (
    <ul className="space-y-2">
      {kinds.map((kind) => (
        <li key={kind} className="flex flex-wrap items-center gap-3 text-sm">
          <Link
            href={`${generatorHref(templateSheetRequest(template, kind)!)}${workspaceSlug ? `&workspace=${workspaceSlug}` : ''}`}
            className="rounded-md bg-spark-500 px-3 py-1.5 font-semibold text-steel-950 hover:bg-spark-400"
          >
            Print a {KIND_LABELS[kind]}
          </Link>
          <a href={`${sheetUrl}?kind=${kind}&format=pdf`} className="text-gauge-700 underline dark:text-gauge-300">
            {KIND_LABELS[kind]} PDF
          </a>
          <a href={`${sheetUrl}?kind=${kind}&format=svg`} className="text-gauge-700 underline dark:text-gauge-300">
            {KIND_LABELS[kind]} SVG
          </a>
        </li>
      ))}
    </ul>
  );
}
