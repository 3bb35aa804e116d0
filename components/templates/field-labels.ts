import type { TemplateFieldName } from '@/lib/templates/template-schema';

/** How each template field is named and shown on screen (history, detail, list). */
export const FIELD_LABELS: Record<TemplateFieldName, string> = {
  name: 'Name',
  description: 'Engine description',
  boreMm: 'Bore',
  strokeMm: 'Stroke',
  rodMm: 'Con-rod length',
  rotation: 'Rotation',
  rimDiameterMm: 'Rim diameter',
  faceDiameterMm: 'Face diameter',
  flangeDiameterMm: 'Flange diameter',
  hubHoleMm: 'Hub hole',
  staticAdvanceDeg: 'Static advance',
  advanceMarksDeg: 'Advance marks',
  portTargets: 'Port targets',
  notes: 'Notes',
  archived: 'Archived',
};

const UNITS: Partial<Record<TemplateFieldName, string>> = {
  boreMm: ' mm',
  strokeMm: ' mm',
  rodMm: ' mm',
  rimDiameterMm: ' mm',
  faceDiameterMm: ' mm',
  flangeDiameterMm: ' mm',
  hubHoleMm: ' mm',
  staticAdvanceDeg: '° BTDC',
};

type Port = { name: string; opensCrankDeg: number; closesCrankDeg: number };

/** A field's value as text: units, lists, and "—" for unknown. */
export function formatFieldValue(field: string, value: unknown): string {
  if (value === null || value === undefined || value === '') return '—';
  if (field === 'rotation') return value === 'ccw' ? 'counter-clockwise' : 'clockwise';
  if (field === 'archived') return value ? 'yes' : 'no';
  if (field === 'advanceMarksDeg') return (value as number[]).length ? `${(value as number[]).join(', ')}° BTDC` : '—';
  if (field === 'portTargets')
    return (value as Port[]).length ? (value as Port[]).map((p) => `${p.name} ${p.opensCrankDeg}°→${p.closesCrankDeg}°`).join('; ') : '—';
  return `${String(value)}${UNITS[field as TemplateFieldName] ?? ''}`;
}
