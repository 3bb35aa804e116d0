import { z } from 'zod';
import { shapeOf, type Field } from '@/lib/fields/field';
import { TEMPLATE_FIELD_LIST, templateFields, type TemplateFieldName } from './template-fields';

/**
 * The one schema for an engine template, derived from its field table
 * (template-fields.ts) plus the rules across fields: the browser form, the
 * route handlers and the CSV import all validate with it. Messages name the
 * field by its label with the allowed range.
 */

export { TEMPLATE_FIELD_NAMES, type TemplateFieldName } from './template-fields';

/** Radial gap between the flywheel rim and a flange ring's inner edge (the ring must clear the flywheel). */
export const RING_CLEARANCE_MM = 1;

const templateFieldShape = shapeOf(templateFields);

export type TemplateFields = { [K in TemplateFieldName]: z.output<(typeof templateFieldShape)[K]> };

/** What a field holds when a template leaves it out: no text, no measurement, no list, the first choice, no. */
function emptyValue(field: Field): unknown {
  switch (field.kind) {
    case 'text':
      return '';
    case 'choice':
      return field.choices?.[0];
    case 'list':
      return [];
    case 'flag':
      return false;
    default:
      return null;
  }
}

export const EMPTY_TEMPLATE = Object.fromEntries(
  TEMPLATE_FIELD_LIST.filter((field) => field.key !== 'name').map((field) => [field.key, emptyValue(field)]),
) as Omit<TemplateFields, 'name'>;

type Refinable = Partial<Pick<TemplateFields, 'faceDiameterMm' | 'hubHoleMm' | 'rimDiameterMm' | 'flangeDiameterMm'>>;

/** Rules across fields, checked on the whole template (after a patch is merged in). */
export function templateCrossFieldIssues(t: Refinable): Array<{ path: TemplateFieldName; message: string }> {
  const issues: Array<{ path: TemplateFieldName; message: string }> = [];
  if (t.hubHoleMm != null && t.faceDiameterMm != null && t.hubHoleMm >= t.faceDiameterMm)
    issues.push({
      path: 'hubHoleMm',
      message: `${templateFields.hubHoleMm.label} must be smaller than the flywheel face diameter (0 to under ${t.faceDiameterMm} mm)`,
    });
  if (t.flangeDiameterMm != null && t.rimDiameterMm != null && t.flangeDiameterMm <= t.rimDiameterMm + RING_CLEARANCE_MM)
    issues.push({
      path: 'flangeDiameterMm',
      message: `${templateFields.flangeDiameterMm.label} must be larger than the rim diameter plus ${RING_CLEARANCE_MM} mm clearance (over ${t.rimDiameterMm + RING_CLEARANCE_MM} mm)`,
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
  z.object(
    Object.fromEntries(
      TEMPLATE_FIELD_LIST.map((field) => [field.key, field.key === 'name' ? field.schema : z._default(field.schema, emptyValue(field) as never)]),
    ) as { [K in TemplateFieldName]: K extends 'name' ? (typeof templateFieldShape)[K] : z.ZodDefault<(typeof templateFieldShape)[K]> },
  ),
);

export const versionSchema = z
  .number({ error: 'Version must be the version number you loaded, a whole number from 1' })
  .int('Version must be a whole number from 1')
  .min(1, 'Version must be a whole number from 1');

/** PATCH body: the version the edit started from plus any fields to change (`null` clears a measurement). */
export const templatePatchSchema = z
  .object({ version: versionSchema, ...templateFieldShape })
  .partial()
  .required({ version: true })
  .strict();

/** The form edits a whole template and carries the version it was loaded at (absent when creating). */
export const templateFormSchema = withCrossFieldRules(z.object({ ...templateFieldShape, version: versionSchema.optional() }));
