import { withUnit } from '@/lib/fields/range-text';
import { formatDecimal, formatDecimalList } from '@/lib/format/number-format';
import { TEMPLATE_FIELD_LIST, templateFields, type TemplateFieldName } from '@/lib/templates/template-fields';

/** How each template field is named on screen (history, detail, list): its label in the field table. */
export const FIELD_LABELS = Object.fromEntries(TEMPLATE_FIELD_LIST.map((field) => [field.key, field.label])) as Record<TemplateFieldName, string>;

/** The figures a template page lists: the fields with a unit or a choice, in table order. */
export const FIGURE_FIELDS = TEMPLATE_FIELD_LIST.filter((field) => field.unit !== '' || field.kind === 'choice').map(
  (field) => field.key as TemplateFieldName,
);

type Port = { name: string; opensCrankDeg: number; closesCrankDeg: number };

const CHOICE_WORDS: Record<string, string> = { cw: 'clockwise', ccw: 'counter-clockwise' };

/** Template figures are kept to a thousandth of their unit (a dial gauge's resolution in mm). */
const SHOWN_PLACES = 3;

/** A field's value as text in the reader's locale: units from the field table, lists, and "—" for unknown. */
export function formatFieldValue(field: string, value: unknown, locale: string): string {
  if (value === null || value === undefined || value === '') return '—';
  const info = templateFields[field as TemplateFieldName];
  const unit = info?.unit ?? '';
  if (info?.kind === 'flag') return value ? 'yes' : 'no';
  if (info?.kind === 'choice') return CHOICE_WORDS[String(value)] ?? String(value);
  if (Array.isArray(value)) {
    if (value.length === 0) return '—';
    const deg = (d: number) => `${formatDecimal(d, locale, { maxPlaces: SHOWN_PLACES })}°`;
    if (unit === '') return (value as Port[]).map((p) => `${p.name} ${deg(p.opensCrankDeg)}→${deg(p.closesCrankDeg)}`).join('; ');
    return withUnit(formatDecimalList(value as number[], locale, SHOWN_PLACES), unit);
  }
  return typeof value === 'number' ? withUnit(formatDecimal(value, locale, { maxPlaces: SHOWN_PLACES }), unit) : String(value);
}
