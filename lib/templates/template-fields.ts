import { z } from 'zod';
import { choiceField, flagField, lengthField, listField, numberField, textField } from '../fields/builders';
import { defineFields, fieldsOf } from '../fields/field';
import { ADVANCE_RANGE_DEG, DIAMETER_RANGE_MM, MAX_ADVANCE_MARKS, MAX_PORT_EVENTS, portEventSchema } from '../sheet/sheet-request';

/**
 * The fields of an engine template, declared once. The zod schema
 * (template-schema.ts), the SQL row mapping (db/templates/template-row.ts),
 * the CSV columns, the list's columns, sort keys and search, the form and the
 * labels on the page and in the history all read this table. Lengths in mm,
 * angles in degrees; a measurement is `null` when unknown.
 */

export const BORE_RANGE_MM = { min: 10, max: 150 } as const;
export const STROKE_RANGE_MM = { min: 10, max: 150 } as const;
export const ROD_RANGE_MM = { min: 20, max: 400 } as const;
export const NAME_MAX = 80;

const sortable = { column: true, sort: true } as const;

/** Port names travel through CSV cells as `name:opens/closes;…`, so those separators are kept out of names. */
const portTargetSchema = portEventSchema.refine((p) => !/[;:/]/.test(p.name), {
  message: 'Port name must not contain ; : or /',
  path: ['name'],
});

export const templateFields = defineFields({
  name: textField({ label: 'Name', minLength: 1, maxLength: NAME_MAX, csvColumn: 'name', column: 'name', list: { ...sortable, search: true } }),
  description: textField({
    label: 'Engine description',
    maxLength: 200,
    csvColumn: 'description',
    column: 'description',
    list: { ...sortable, search: true, header: 'Engine' },
    help: 'What engine this is: capacity, induction, cooling.',
  }),
  boreMm: lengthField({ label: 'Bore', ...BORE_RANGE_MM, csvColumn: 'bore_mm', column: 'bore_mm', list: sortable }).nullable(),
  strokeMm: lengthField({ label: 'Stroke', ...STROKE_RANGE_MM, csvColumn: 'stroke_mm', column: 'stroke_mm', list: sortable }).nullable(),
  rodMm: lengthField({ label: 'Con-rod length', ...ROD_RANGE_MM, csvColumn: 'rod_mm', column: 'rod_mm', list: { sort: true }, help: 'Centre to centre' }).nullable(),
  rotation: choiceField({
    label: 'Rotation',
    choices: ['cw', 'ccw'],
    csvColumn: 'rotation',
    column: 'rotation',
    list: sortable,
    help: 'As seen from the side the scale is mounted on',
  }),
  rimDiameterMm: lengthField({
    label: 'Flywheel rim diameter',
    ...DIAMETER_RANGE_MM,
    csvColumn: 'rim_diameter_mm',
    column: 'rim_diameter_mm',
    list: { ...sortable, header: 'Rim Ø' },
    help: 'For rim strips; with a flange diameter also flange rings',
  }).nullable(),
  faceDiameterMm: lengthField({
    label: 'Flywheel face diameter',
    ...DIAMETER_RANGE_MM,
    csvColumn: 'face_diameter_mm',
    column: 'face_diameter_mm',
    list: { ...sortable, header: 'Face Ø' },
    help: 'For degree wheels',
  }).nullable(),
  flangeDiameterMm: lengthField({
    label: 'Flange diameter',
    ...DIAMETER_RANGE_MM,
    csvColumn: 'flange_diameter_mm',
    column: 'flange_diameter_mm',
    list: { ...sortable, header: 'Flange Ø' },
    help: 'Magneto flange or stator plate',
  }).nullable(),
  hubHoleMm: lengthField({
    label: 'Hub hole',
    min: 0,
    max: DIAMETER_RANGE_MM.max,
    csvColumn: 'hub_hole_mm',
    column: 'hub_hole_mm',
    list: { sort: true },
    help: 'Hole cut in a degree wheel',
  }).nullable(),
  staticAdvanceDeg: numberField({
    label: 'Static advance',
    ...ADVANCE_RANGE_DEG,
    unit: '° BTDC',
    csvColumn: 'static_advance_deg_btdc',
    column: 'static_advance_deg',
    list: { ...sortable, header: 'Advance' },
    help: 'Small air-cooled two-strokes are typically 16–20° BTDC; the engine maker’s manual comes first.',
  }).nullable(),
  advanceMarksDeg: listField(
    {
      label: 'Advance marks',
      unit: '° BTDC',
      csvColumn: 'advance_marks_deg_btdc',
      column: 'advance_marks_json',
      help: 'For example 16, 18, 20. Left empty, the sheet marks the static advance alone.',
    },
    z
      .array(numberField({ label: 'Advance mark', ...ADVANCE_RANGE_DEG, unit: '° BTDC' }).schema, {
        error: 'Advance marks must be a list of angles, 0–60° BTDC',
      })
      .max(MAX_ADVANCE_MARKS, `Advance marks: at most ${MAX_ADVANCE_MARKS} angles`),
  ),
  portTargets: listField(
    {
      label: 'Port targets',
      csvColumn: 'port_targets',
      column: 'port_targets_json',
      help: 'Crank angles from TDC in the direction of rotation (0–360°): exhaust opening near 90° ATDC is 90, its closing 270.',
    },
    z
      .array(portTargetSchema, { error: 'Port targets must be a list of { name, opensCrankDeg, closesCrankDeg }' })
      .max(MAX_PORT_EVENTS, `Port targets: at most ${MAX_PORT_EVENTS}`),
  ),
  notes: textField({
    label: 'Notes',
    maxLength: 4000,
    csvColumn: 'notes',
    column: 'notes',
    help: 'Where the pointer sits, which marks to trust, anything the next person should know.',
  }),
  archived: flagField({ label: 'Archived', csvColumn: 'archived', column: 'archived' }),
});

export type TemplateFieldName = keyof typeof templateFields;
export const TEMPLATE_FIELD_NAMES = Object.keys(templateFields) as TemplateFieldName[];
export const TEMPLATE_FIELD_LIST = fieldsOf(templateFields);
