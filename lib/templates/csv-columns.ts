import type { TemplateFieldName } from './template-schema';

/**
 * The template CSV column set (import and export), one row per template,
 * units in the headers. The header row is required; columns may come in any
 * order and all but `name` may be left out (a missing column or an empty cell
 * means "not known" for measurements and the default otherwise).
 *
 *   name                      text, 1–80 characters (required)
 *   description               engine description, up to 200 characters
 *   bore_mm                   cylinder bore, mm (10–150)
 *   stroke_mm                 stroke, mm (10–150)
 *   rod_mm                    con-rod length centre to centre, mm (20–400)
 *   rotation                  cw or ccw, as seen from the side the scale is mounted on (default cw)
 *   rim_diameter_mm           flywheel rim (outer) diameter, mm (20–600): rim strips and flange rings
 *   face_diameter_mm          flywheel face diameter, mm (20–600): degree wheels
 *   flange_diameter_mm        magneto flange / stator plate diameter, mm (20–600): flange rings
 *   hub_hole_mm               hub hole in a degree wheel, mm (0–600)
 *   static_advance_deg_btdc   static ignition advance, degrees BTDC (0–60)
 *   advance_marks_deg_btdc    advance marks, degrees BTDC separated by ";" e.g. 16;18;20
 *   port_targets              port timing targets in crank degrees (0 = TDC, ATDC counts up),
 *                             "name:opens/closes" separated by ";" e.g. exhaust:92/268;transfer:118/242
 *   notes                     free text, up to 4000 characters
 *   archived                  true or false (default false)
 *
 * Decimal point is "."; text cells that start with = + - @ are written with a
 * leading ' (spreadsheet formula guard) and read back without it.
 */
export const CSV_COLUMNS = [
  'name',
  'description',
  'bore_mm',
  'stroke_mm',
  'rod_mm',
  'rotation',
  'rim_diameter_mm',
  'face_diameter_mm',
  'flange_diameter_mm',
  'hub_hole_mm',
  'static_advance_deg_btdc',
  'advance_marks_deg_btdc',
  'port_targets',
  'notes',
  'archived',
] as const;
export type CsvColumn = (typeof CSV_COLUMNS)[number];

export type CsvColumnKind = 'text' | 'number' | 'rotation' | 'list' | 'ports' | 'boolean';

export type CsvColumnSpec = { column: CsvColumn; field: TemplateFieldName; kind: CsvColumnKind; meaning: string };

export const CSV_COLUMN_SPECS: readonly CsvColumnSpec[] = [
  { column: 'name', field: 'name', kind: 'text', meaning: 'Template name, 1–80 characters (required)' },
  { column: 'description', field: 'description', kind: 'text', meaning: 'Engine description, up to 200 characters' },
  { column: 'bore_mm', field: 'boreMm', kind: 'number', meaning: 'Cylinder bore in mm (10–150)' },
  { column: 'stroke_mm', field: 'strokeMm', kind: 'number', meaning: 'Stroke in mm (10–150)' },
  { column: 'rod_mm', field: 'rodMm', kind: 'number', meaning: 'Con-rod length centre to centre in mm (20–400)' },
  { column: 'rotation', field: 'rotation', kind: 'rotation', meaning: 'cw or ccw, as seen from the side the scale is mounted on' },
  { column: 'rim_diameter_mm', field: 'rimDiameterMm', kind: 'number', meaning: 'Flywheel rim diameter in mm (20–600)' },
  { column: 'face_diameter_mm', field: 'faceDiameterMm', kind: 'number', meaning: 'Flywheel face diameter in mm (20–600)' },
  { column: 'flange_diameter_mm', field: 'flangeDiameterMm', kind: 'number', meaning: 'Flange / stator plate diameter in mm (20–600)' },
  { column: 'hub_hole_mm', field: 'hubHoleMm', kind: 'number', meaning: 'Hub hole of a degree wheel in mm (0–600)' },
  { column: 'static_advance_deg_btdc', field: 'staticAdvanceDeg', kind: 'number', meaning: 'Static advance in degrees BTDC (0–60)' },
  { column: 'advance_marks_deg_btdc', field: 'advanceMarksDeg', kind: 'list', meaning: 'Advance marks in degrees BTDC, ";"-separated, e.g. 16;18;20' },
  { column: 'port_targets', field: 'portTargets', kind: 'ports', meaning: 'name:opens/closes in crank degrees (0 = TDC, counting the way the engine turns, 0–360), ";"-separated, e.g. exhaust:92/268' },
  { column: 'notes', field: 'notes', kind: 'text', meaning: 'Free text, up to 4000 characters' },
  { column: 'archived', field: 'archived', kind: 'boolean', meaning: 'true or false' },
];

export function columnForField(field: string): CsvColumn | undefined {
  return CSV_COLUMN_SPECS.find((s) => s.field === field)?.column;
}
