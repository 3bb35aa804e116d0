import type { SheetRequestInput } from '@/lib/sheet/sheet-request';
import type { Template } from '@/lib/templates/template';
import { availableSheetKinds, templateSheetRequest, type TemplateSheetKind } from '@/lib/templates/template-sheet';
import type { Build } from './build';
import { SHEET_NUMERALS_LOCALE } from '@/lib/format/number-format';
import { signedDegText } from './customer-copy';

/**
 * The sheets of one build: the template's diameters, the record's rotation and port targets,
 * the timing as set as the advance mark, and the measured TDC correction as the note.
 */
export function buildSheetRequest(template: Template, build: Build, kind: TemplateSheetKind): SheetRequestInput | null {
  const timing = build.timingSetDegBTDC === null ? null : Number(build.timingSetDegBTDC.toFixed(1));
  const request = templateSheetRequest(
    {
      ...template,
      rotation: build.rotation,
      staticAdvanceDeg: timing ?? template.staticAdvanceDeg,
      advanceMarksDeg: timing === null ? template.advanceMarksDeg : [timing],
      portTargets: build.portTargets,
      name: [build.customerName, build.engineNumber].filter(Boolean).join(' · '),
    },
    kind,
  );
  if (!request) return null;
  const note = build.tdc ? `TDC found with a positive stop: pointer corrected by ${signedDegText(build.tdc.correctionDeg, SHEET_NUMERALS_LOCALE)}` : template.description;
  return { ...request, note: note.slice(0, 200) };
}

export function buildSheetKinds(template: Template): TemplateSheetKind[] {
  return availableSheetKinds(template);
}
