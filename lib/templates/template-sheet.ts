import type { SheetRequestInput } from '@/lib/sheet/sheet-request';
import { templateFields } from './template-fields';
import { RING_CLEARANCE_MM, type TemplateFields } from './template-schema';

export const TEMPLATE_SHEET_KINDS = ['wheel', 'ring', 'strip'] as const;
export type TemplateSheetKind = (typeof TEMPLATE_SHEET_KINDS)[number];

type SheetSource = Pick<
  TemplateFields,
  | 'name'
  | 'description'
  | 'rotation'
  | 'rimDiameterMm'
  | 'faceDiameterMm'
  | 'flangeDiameterMm'
  | 'hubHoleMm'
  | 'staticAdvanceDeg'
  | 'advanceMarksDeg'
  | 'portTargets'
>;

/**
 * The diameters each sheet needs: a face diameter gives a degree wheel (disc on
 * the flywheel face), a rim and a flange diameter give a flange ring, a rim
 * diameter gives a rim strip.
 */
const SHEET_NEEDS: Record<TemplateSheetKind, ReadonlyArray<'faceDiameterMm' | 'rimDiameterMm' | 'flangeDiameterMm'>> = {
  wheel: ['faceDiameterMm'],
  ring: ['rimDiameterMm', 'flangeDiameterMm'],
  strip: ['rimDiameterMm'],
};

/** Which sheets a template can print, decided by the diameters it has. */
export function availableSheetKinds(t: SheetSource): TemplateSheetKind[] {
  return TEMPLATE_SHEET_KINDS.filter((kind) => SHEET_NEEDS[kind].every((field) => t[field] != null));
}

/** "the flywheel rim diameter and the flange diameter": what a kind of sheet needs, by label. */
export function sheetNeeds(kind: TemplateSheetKind): string {
  return SHEET_NEEDS[kind].map((field) => `the ${templateFields[field].label.toLowerCase()}`).join(' and ');
}

/** The marks to draw: the template's advance marks, or its static advance alone when it lists none. */
function advanceMarks(t: SheetSource): number[] {
  if (t.advanceMarksDeg.length > 0) return [...t.advanceMarksDeg];
  return t.staticAdvanceDeg != null ? [t.staticAdvanceDeg] : [];
}

export type TemplateSheetOptions = { numbering?: 'split' | 'full' };

/**
 * The sheet request (lib/sheet/sheet-request.ts fields) for one kind of sheet
 * from a template, or `null` when the template lacks the diameters for it.
 * A wheel and a strip ride on the flywheel (rotating carrier); a ring sits on
 * the flange and reads against the flywheel's mark (stationary carrier).
 */
export function templateSheetRequest(
  t: SheetSource,
  kind: TemplateSheetKind,
  options: TemplateSheetOptions = {},
): SheetRequestInput | null {
  if (!availableSheetKinds(t).includes(kind)) return null;
  const common = {
    rotation: t.rotation,
    numbering: options.numbering ?? 'split',
    advanceMarksDeg: advanceMarks(t),
    portEvents: t.portTargets.map((p) => ({ ...p })),
    title: t.name.slice(0, 80),
    ...(t.description ? { note: t.description.slice(0, 200) } : {}),
  } satisfies Partial<SheetRequestInput>;
  if (kind === 'wheel')
    return { kind, ...common, carrier: 'rotating', diameterMm: t.faceDiameterMm!, hubHoleMm: t.hubHoleMm ?? 0 };
  if (kind === 'ring')
    return {
      kind,
      ...common,
      carrier: 'stationary',
      innerDiameterMm: t.rimDiameterMm! + RING_CLEARANCE_MM,
      outerDiameterMm: t.flangeDiameterMm!,
    };
  return { kind, ...common, carrier: 'rotating', diameterMm: t.rimDiameterMm! };
}
