import { withUnit } from '@/lib/fields/range-text';
import { TEMPLATE_FIELD_LIST, templateFields, type TemplateFieldName } from '@/lib/templates/template-fields';

/** How each template field is named on screen (history, detail, list): its label in the field table. */
export const FIELD_LABELS = Object.fromEntries(TEMPLATE_FIELD_LIST.map((field) => [field.key, field.label])) as Record<TemplateFieldName, string>;

/** The figures a template page lists: the fields with a unit or a choice, in table order. */
export const FIGURE_FIELDS = TEMPLATE_FIELD_LIST.filter((field) => field.unit !== '' || field.kind === 'choice').map(
  (field) => field.key as TemplateFieldName,
);

type Port = { name: string; opensCrankDeg: number; closesCrankDeg: number };

const CHOICE_WORDS: Record<string, string> = { cw: 'clockwise', ccw: 'counter-clockwise' };

/** A field's value as text: units from the field table, lists, and "—" for unknown. */
export function formatFieldValue(field: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  const info = templateFields[field as TemplateFieldName];
  const unit = info?.unit ?? '';
  if (info?.kind === 'flag') return value ? 'yes' : 'no';
  if (info?.kind === 'choice') return CHOICE_WORDS[String(value)] ?? String(value);
  if (Array.isArray(value)) {
    if (value.length === 0) return '—';
    if (unit === '') return (value as Port[]).map((p) => `${p.name} ${p.opensCrankDeg}°→${p.closesCrankDeg}°`).join('; ');
    return withUnit(value.join(', '), unit);
  }
  return typeof value === 'number' ? withUnit(value, unit) : String(value);
}
