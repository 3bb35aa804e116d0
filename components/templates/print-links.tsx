import Link from 'next/link';
import { generatorHref } from '@/lib/templates/generator-href';
import { availableSheetKinds, templateSheetRequest, type TemplateSheetKind } from '@/lib/templates/template-sheet';
import type { Template } from '@/lib/templates/template';

const KIND_LABELS: Record<TemplateSheetKind, string> = {
  wheel: 'degree wheel',
  ring: 'flange ring',
  strip: 'rim strip',
};

type Numbering = 'split' | 'full';

const NUMBERING_LABELS: Record<Numbering, string> = {
  split: 'numbered from TDC both ways (ignition)',
  full: 'full circle 0–359 with the port targets',
};

/**
 * One row per sheet the template's diameters allow: open it in the sheet maker, or download PDF / SVG directly.
 * Port targets only show on a full-circle scale, so a template that has them gets that row as well.
 */
export function PrintLinks({ template, sheetUrl, workspaceSlug }: { template: Template; sheetUrl: string; workspaceSlug?: string }) {
  const kinds = availableSheetKinds(template);
  if (kinds.length === 0)
    return <p className="text-sm text-steel-600">Add a flywheel face or rim diameter to print from this template.</p>;
  const numberings: Numbering[] = template.portTargets.length > 0 ? ['split', 'full'] : ['split'];
  const rows = kinds.flatMap((kind) => numberings.map((numbering) => ({ kind, numbering })));
  return (
    <ul className="space-y-3">
      {rows.map(({ kind, numbering }) => {
        const what = `${KIND_LABELS[kind]}, ${NUMBERING_LABELS[numbering]}`;
        const query = `kind=${kind}${numbering === 'full' ? '&numbering=full' : ''}`;
        return (
          <li key={`${kind}-${numbering}`} className="flex flex-wrap items-center gap-x-3 gap-y-1 text-sm">
            <Link
              href={`${generatorHref(templateSheetRequest(template, kind, { numbering })!)}${workspaceSlug ? `&workspace=${workspaceSlug}` : ''}`}
              className="inline-flex min-h-11 items-center rounded-md bg-spark-500 px-3 font-semibold text-steel-950 hover:bg-spark-400"
            >
              Print a {what}
            </Link>
            <a href={`${sheetUrl}?${query}&format=pdf`} aria-label={`PDF: ${what}`} className="inline-flex min-h-11 items-center text-gauge-700 underline dark:text-gauge-300">
              PDF
            </a>
            <a href={`${sheetUrl}?${query}&format=svg`} aria-label={`SVG: ${what}`} className="inline-flex min-h-11 items-center text-gauge-700 underline dark:text-gauge-300">
              SVG
            </a>
          </li>
        );
      })}
    </ul>
  );
}
