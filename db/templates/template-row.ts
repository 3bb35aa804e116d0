import { TEMPLATE_SORT_KEYS, type TemplateSortKey } from '@/lib/templates/list-query';
import type { Template } from '@/lib/templates/template';
import type { TemplateFields } from '@/lib/templates/template-schema';

/** A row of the templates table, joined with the names of its creator and last editor. */
export type TemplateRow = {
  id: number;
  workspace_id: number;
  name: string;
  description: string;
  bore_mm: number | null;
  stroke_mm: number | null;
  rod_mm: number | null;
  rotation: 'cw' | 'ccw';
  rim_diameter_mm: number | null;
  face_diameter_mm: number | null;
  flange_diameter_mm: number | null;
  hub_hole_mm: number | null;
  static_advance_deg: number | null;
  advance_marks_json: string;
  port_targets_json: string;
  notes: string;
  archived: number | boolean;
  version: number;
  created_by: number | null;
  updated_by: number | null;
  created_at: string;
  updated_at: string;
  created_by_name?: string | null;
  updated_by_name?: string | null;
};

/** API field → SQL column; the whitelist for sorting and for writes. */
export const FIELD_COLUMNS = {
  name: 'name',
  description: 'description',
  boreMm: 'bore_mm',
  strokeMm: 'stroke_mm',
  rodMm: 'rod_mm',
  rotation: 'rotation',
  rimDiameterMm: 'rim_diameter_mm',
  faceDiameterMm: 'face_diameter_mm',
  flangeDiameterMm: 'flange_diameter_mm',
  hubHoleMm: 'hub_hole_mm',
  staticAdvanceDeg: 'static_advance_deg',
  advanceMarksDeg: 'advance_marks_json',
  portTargets: 'port_targets_json',
  notes: 'notes',
  archived: 'archived',
} as const satisfies Record<keyof TemplateFields, string>;

/** Every column the API names: the fields, the version and the timestamps. */
const API_COLUMNS = { ...FIELD_COLUMNS, version: 'version', createdAt: 'created_at', updatedAt: 'updated_at' } as const;

/** Sort key → SQL column: exactly the sortable keys, so nothing else can reach ORDER BY. */
export const SORT_COLUMNS = Object.fromEntries(TEMPLATE_SORT_KEYS.map((key) => [key, API_COLUMNS[key]])) as Record<TemplateSortKey, string>;

export function rowToFields(row: TemplateRow): TemplateFields {
  return {
    name: row.name,
    description: row.description,
    boreMm: row.bore_mm,
    strokeMm: row.stroke_mm,
    rodMm: row.rod_mm,
    rotation: row.rotation,
    rimDiameterMm: row.rim_diameter_mm,
    faceDiameterMm: row.face_diameter_mm,
    flangeDiameterMm: row.flange_diameter_mm,
    hubHoleMm: row.hub_hole_mm,
    staticAdvanceDeg: row.static_advance_deg,
    advanceMarksDeg: JSON.parse(row.advance_marks_json),
    portTargets: JSON.parse(row.port_targets_json),
    notes: row.notes,
    archived: Boolean(row.archived),
  };
}

export function rowToTemplate(row: TemplateRow): Template {
  return {
    id: row.id,
    ...rowToFields(row),
    version: row.version,
    createdAt: row.created_at,
    updatedAt: row.updated_at,
    createdBy: row.created_by === null ? null : { id: row.created_by, name: row.created_by_name ?? '' },
    updatedBy: row.updated_by === null ? null : { id: row.updated_by, name: row.updated_by_name ?? '' },
  };
}

/** The columns to write for the given fields (only those present). */
export function fieldsToColumns(fields: Partial<TemplateFields>): Record<string, unknown> {
  const columns: Record<string, unknown> = {};
  for (const [field, column] of Object.entries(FIELD_COLUMNS) as Array<[keyof TemplateFields, string]>) {
    if (!(field in fields)) continue;
    const value = fields[field];
    if (field === 'advanceMarksDeg' || field === 'portTargets') columns[column] = JSON.stringify(value ?? []);
    else if (field === 'archived') columns[column] = value ? 1 : 0;
    else columns[column] = value ?? null;
  }
  return columns;
}
