import { z } from 'zod';
import {
  ADVANCE_RANGE_DEG,
  DIAMETER_RANGE_MM,
  MAX_ADVANCE_MARKS,
  MAX_PORT_EVENTS,
  portEventSchema,
} from '@/lib/sheet/sheet-request';

/**
 * The one schema for an engine template: the browser form, the route handlers
 * and the CSV import all validate with it. Lengths in mm, angles in degrees;
 * every optional measurement is `null` when unknown. Messages name the field
 * and the allowed range, like the sheet request's.
 */

export const BORE_RANGE_MM = { min: 10, max: 150 } as const;
export const STROKE_RANGE_MM = { min: 10, max: 150 } as const;
export const ROD_RANGE_MM = { min: 20, max: 400 } as const;
export const NAME_MAX = 80;
export const DESCRIPTION_MAX = 200;
export const NOTES_MAX = 4000;
/** Radial gap between the flywheel rim and a flange ring's inner edge (the ring must clear the flywheel). */
export const RING_CLEARANCE_MM = 1;

const withUnit = (value: number, unit: string) => (unit.startsWith('°') ? `${value}${unit}` : `${value} ${unit}`);

function ranged(label: string, field: string, min: number, max: number, unit: string) {
  const range = `${min}–${withUnit(max, unit)}`;
  return z
    .number({ error: `${label} (${field}) must be a number, ${range}` })
    .min(min, `${label} (${field}) must be at least ${withUnit(min, unit)} (allowed ${range})`)
    .max(max, `${label} (${field}) must be at most ${withUnit(max, unit)} (allowed ${range})`)
    .nullable();
}

const diameter = (label: string, field: string) => ranged(label, field, DIAMETER_RANGE_MM.min, DIAMETER_RANGE_MM.max, 'mm');

/** Port names travel through CSV cells as `name:opens/closes;…`, so those separators are kept out of names. */
const portTargetSchema = portEventSchema.refine((p) => !/[;:/]/.test(p.name), {
  message: 'Port name must not contain ; : or /',
  path: ['name'],
});

export const templateFieldShape = {
  name: z
    .string({ error: `Name (name) must be text, 1–${NAME_MAX} characters` })
    .trim()
    .min(1, `Name (name) must not be empty (1–${NAME_MAX} characters)`)
    .max(NAME_MAX, `Name (name) must be at most ${NAME_MAX} characters`),
  description: z
    .string({ error: `Engine description (description) must be text, up to ${DESCRIPTION_MAX} characters` })
    .trim()
    .max(DESCRIPTION_MAX, `Engine description (description) must be at most ${DESCRIPTION_MAX} characters`),
  boreMm: ranged('Bore', 'boreMm', BORE_RANGE_MM.min, BORE_RANGE_MM.max, 'mm'),
  strokeMm: ranged('Stroke', 'strokeMm', STROKE_RANGE_MM.min, STROKE_RANGE_MM.max, 'mm'),
  rodMm: ranged('Con-rod length (centre to centre)', 'rodMm', ROD_RANGE_MM.min, ROD_RANGE_MM.max, 'mm'),
  rotation: z.enum(['cw', 'ccw'], { error: 'Rotation (rotation) must be one of: cw, ccw' }),
  rimDiameterMm: diameter('Flywheel rim diameter', 'rimDiameterMm'),
  faceDiameterMm: diameter('Flywheel face diameter', 'faceDiameterMm'),
  flangeDiameterMm: diameter('Flange diameter', 'flangeDiameterMm'),
  hubHoleMm: ranged('Hub hole', 'hubHoleMm', 0, DIAMETER_RANGE_MM.max, 'mm'),
  staticAdvanceDeg: ranged('Static advance', 'staticAdvanceDeg', ADVANCE_RANGE_DEG.min, ADVANCE_RANGE_DEG.max, '° BTDC'),
  advanceMarksDeg: z
    .array(
      z
        .number({ error: `Advance mark (advanceMarksDeg) must be a number, 0–${ADVANCE_RANGE_DEG.max}° BTDC` })
        .min(ADVANCE_RANGE_DEG.min, `Advance mark (advanceMarksDeg) must be at least 0° BTDC (allowed 0–${ADVANCE_RANGE_DEG.max}° BTDC)`)
        .max(ADVANCE_RANGE_DEG.max, `Advance mark (advanceMarksDeg) must be at most ${ADVANCE_RANGE_DEG.max}° BTDC (allowed 0–${ADVANCE_RANGE_DEG.max}° BTDC)`),
      { error: 'Advance marks (advanceMarksDeg) must be a list of angles, 0–60° BTDC' },
    )
    .max(MAX_ADVANCE_MARKS, `Advance marks (advanceMarksDeg): at most ${MAX_ADVANCE_MARKS} angles`),
  portTargets: z
    .array(portTargetSchema, { error: 'Port targets (portTargets) must be a list of { name, opensCrankDeg, closesCrankDeg }' })
    .max(MAX_PORT_EVENTS, `Port targets (portTargets): at most ${MAX_PORT_EVENTS}`),
  notes: z
    .string({ error: `Notes (notes) must be text, up to ${NOTES_MAX} characters` })
    .trim()
    .max(NOTES_MAX, `Notes (notes) must be at most ${NOTES_MAX} characters`),
  archived: z.boolean({ error: 'Archived (archived) must be true or false' }),
};

export type TemplateFields = { [K in keyof typeof templateFieldShape]: z.output<(typeof templateFieldShape)[K]> };
export type TemplateFieldName = keyof TemplateFields;
export const TEMPLATE_FIELD_NAMES = Object.keys(templateFieldShape) as TemplateFieldName[];

export const EMPTY_TEMPLATE: Omit<TemplateFields, 'name'> = {
  description: '',
  boreMm: null,
  strokeMm: null,
  rodMm: null,
  rotation: 'cw',
  rimDiameterMm: null,
  faceDiameterMm: null,
  flangeDiameterMm: null,
  hubHoleMm: null,
  staticAdvanceDeg: null,
  advanceMarksDeg: [],
  portTargets: [],
  notes: '',
  archived: false,
};

type Refinable = Partial<Pick<TemplateFields, 'faceDiameterMm' | 'hubHoleMm' | 'rimDiameterMm' | 'flangeDiameterMm'>>;

/** Rules across fields, checked on the whole template (after a patch is merged in). */
export function templateCrossFieldIssues(t: Refinable): Array<{ path: TemplateFieldName; message: string }> {
  const issues: Array<{ path: TemplateFieldName; message: string }> = [];
  if (t.hubHoleMm != null && t.faceDiameterMm != null && t.hubHoleMm >= t.faceDiameterMm)
    issues.push({
      path: 'hubHoleMm',
      message: `Hub hole (hubHoleMm) must be smaller than the flywheel face diameter (0 to under ${t.faceDiameterMm} mm)`,
    });
  if (t.flangeDiameterMm != null && t.rimDiameterMm != null && t.flangeDiameterMm <= t.rimDiameterMm + RING_CLEARANCE_MM)
    issues.push({
      path: 'flangeDiameterMm',
      message: `Flange diameter (flangeDiameterMm) must be larger than the rim diameter plus ${RING_CLEARANCE_MM} mm clearance (over ${t.rimDiameterMm + RING_CLEARANCE_MM} mm)`,
    });
  return issues;
}

function withCrossFieldRules<T extends z.ZodType<Refinable>>(schema: T) {
  return schema.superRefine((t, ctx) => {
    for (const issue of templateCrossFieldIssues(t)) ctx.addIssue({ code: 'custom', path: [issue.path], message: issue.message });
  });
}

/** A whole template; absent optional fields take their empty value. Used by create, the form and CSV rows. */
export const templateSchema = withCrossFieldRules(
  z.object({
    ...templateFieldShape,
    description: templateFieldShape.description.default(EMPTY_TEMPLATE.description),
    boreMm: templateFieldShape.boreMm.default(null),
    strokeMm: templateFieldShape.strokeMm.default(null),
    rodMm: templateFieldShape.rodMm.default(null),
    rotation: templateFieldShape.rotation.default('cw'),
    rimDiameterMm: templateFieldShape.rimDiameterMm.default(null),
    faceDiameterMm: templateFieldShape.faceDiameterMm.default(null),
    flangeDiameterMm: templateFieldShape.flangeDiameterMm.default(null),
    hubHoleMm: templateFieldShape.hubHoleMm.default(null),
    staticAdvanceDeg: templateFieldShape.staticAdvanceDeg.default(null),
    advanceMarksDeg: templateFieldShape.advanceMarksDeg.default([]),
    portTargets: templateFieldShape.portTargets.default([]),
    notes: templateFieldShape.notes.default(''),
    archived: templateFieldShape.archived.default(false),
  }),
);

export const versionSchema = z
  .number({ error: 'Version (version) must be the version number you loaded, a whole number from 1' })
  .int('Version (version) must be a whole number from 1')
  .min(1, 'Version (version) must be a whole number from 1');

/** PATCH body: the version the edit started from plus any fields to change (`null` clears a measurement). */
export const templatePatchSchema = z
  .object({ version: versionSchema, ...templateFieldShape })
  .partial()
  .required({ version: true })
  .strict();

/** The form edits a whole template and carries the version it was loaded at (absent when creating). */
export const templateFormSchema = withCrossFieldRules(z.object({ ...templateFieldShape, version: versionSchema.optional() }));
