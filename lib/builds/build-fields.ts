import { z } from 'zod';
import { choiceField, lengthField, listField, numberField, textField } from '@/lib/fields/builders';
import { defineFields, fieldsOf } from '@/lib/fields/field';
import { rangedNumber } from '@/lib/fields/ranged-number';
import { PIN_OFFSET_LIMIT_MM } from '@/lib/engine/offset-slider-crank';
import { tdcSchema } from '@/lib/engine/tdc-schema';
import { ADVANCE_RANGE_DEG, portEventSchema } from '@/lib/sheet/sheet-request';

/**
 * The build record's fields, declared once: the form, the API's create and patch,
 * the stored row, the CSV export and the list read this table. Lengths in mm, angles
 * in degrees; an optional measurement is `null` until it is taken.
 */

export const BUILD_STATUSES = ['open', 'done', 'handed-over'] as const;
export type BuildStatus = (typeof BUILD_STATUSES)[number];

export const TIMING_CHECKS = ['static-light', 'static-feeler', 'strobe'] as const;

export const MAX_BUILD_PORTS = 12;
export const MAX_FREE_MEASUREMENTS = 20;
export const BUILD_NOTES_MAX = 4000;
/** Ignition timing in piston travel before TDC: a small engine sets it within the first few mm (common practice). */
export const TIMING_MM_RANGE = { min: 0, max: 20 } as const;

const portNameSchema = z
  .string({ error: 'Port name must be text, 1–24 characters' })
  .trim()
  .min(1, 'Port name must not be empty (1–24 characters)')
  .max(24, 'Port name must be at most 24 characters');

export const PORT_HEIGHT_RANGE_MM = { min: 0, max: 400 } as const;

/** A measured port: its top edge below the cylinder top, as the port calculator takes it. */
const measuredPortSchema = z.object({
  name: portNameSchema,
  heightMm: rangedNumber({ label: 'Port edge height', ...PORT_HEIGHT_RANGE_MM, unit: 'mm' }),
});

const freeMeasurementSchema = z.object({
  name: z.string({ error: 'Measurement name must be text, 1–40 characters' }).trim().min(1, 'Measurement name must not be empty (1–40 characters)').max(40, 'Measurement name must be at most 40 characters'),
  value: z.string({ error: 'Measurement value must be text, up to 40 characters' }).trim().max(40, 'Measurement value must be at most 40 characters'),
  unit: z.string({ error: 'Measurement unit must be text, up to 12 characters' }).trim().max(12, 'Measurement unit must be at most 12 characters'),
});

/** Two readings of a positive stop, as the TDC calculator takes them; equal readings cannot come from a stop. */
const stopsSchema = tdcSchema.superRefine((value, ctx) => {
  if (value.readingADeg === value.readingBDeg && value.readingASide === value.readingBSide)
    ctx.addIssue({
      code: 'custom',
      path: ['readingBDeg'],
      message: 'Reading B must differ from reading A: a positive stop touches the piston once on each side of TDC, so the two readings cannot be equal',
    });
});

const emailSchema = z
  .string({ error: 'Customer e-mail must be text, up to 120 characters' })
  .trim()
  .max(120, 'Customer e-mail must be at most 120 characters')
  .refine((text) => text === '' || z.email().safeParse(text).success, 'Customer e-mail must be an address like name@example.com, or left blank');

const isoDateSchema = z
  .string({ error: 'Opened on must be a date, YYYY-MM-DD' })
  .regex(/^\d{4}-\d{2}-\d{2}$/, 'Opened on must be a date, YYYY-MM-DD')
  .refine((text) => !Number.isNaN(Date.parse(`${text}T00:00:00Z`)) && new Date(`${text}T00:00:00Z`).toISOString().startsWith(text), 'Opened on must be a real date, YYYY-MM-DD');

export const buildFields = defineFields({
  customerName: textField({
    label: 'Customer name',
    minLength: 1,
    maxLength: 120,
    column: 'customer_name',
    csvColumn: 'customer_name',
    list: { column: true, sort: true, search: true },
  }),
  customerEmail: textField({ label: 'Customer e-mail', maxLength: 120, column: 'customer_email', csvColumn: 'customer_email' }).withSchema(emailSchema),
  customerPhone: textField({ label: 'Customer phone', maxLength: 40, column: 'customer_phone', csvColumn: 'customer_phone' }),
  engineNumber: textField({
    label: 'Engine number',
    maxLength: 60,
    column: 'engine_number',
    csvColumn: 'engine_number',
    list: { column: true, sort: true, search: true },
  }),
  frameNumber: textField({ label: 'Frame number', maxLength: 60, column: 'frame_number', csvColumn: 'frame_number' }),
  engineDescription: textField({
    label: 'Engine',
    maxLength: 200,
    column: 'engine_description',
    csvColumn: 'engine',
    list: { column: true, sort: true, search: true },
    help: 'What the customer brought in, in your words',
  }),
  templateId: numberField({ label: 'Template', min: 1, max: 2 ** 31 - 1, column: 'template_id', csvColumn: 'template_id' }).nullable(),
  templateVersion: numberField({ label: 'Template version', min: 1, max: 2 ** 31 - 1, column: 'template_version', csvColumn: 'template_version' }).nullable(),
  technicianId: numberField({ label: 'Technician', min: 1, max: 2 ** 31 - 1, column: 'technician_id' }).nullable(),
  status: choiceField({ label: 'Status', choices: BUILD_STATUSES, column: 'status', csvColumn: 'status', list: { column: true, sort: true } }),
  openedOn: textField({ label: 'Opened on', maxLength: 10, column: 'opened_on', csvColumn: 'opened_on', list: { column: true, sort: true } }).withSchema(
    isoDateSchema,
  ),
  strokeMm: lengthField({ label: 'Stroke', min: 10, max: 150, column: 'stroke_mm', csvColumn: 'stroke_mm' }).nullable(),
  rodMm: lengthField({ label: 'Con-rod length (centre to centre)', min: 20, max: 400, column: 'rod_mm', csvColumn: 'rod_mm' }).nullable(),
  pinOffsetMm: lengthField({
    label: 'Wrist-pin offset',
    min: -PIN_OFFSET_LIMIT_MM,
    max: PIN_OFFSET_LIMIT_MM,
    column: 'pin_offset_mm',
    csvColumn: 'pin_offset_mm',
    help: 'Positive toward the side the crank pin swings to just after TDC; 0 for a centred pin',
  }),
  deckMm: lengthField({
    label: 'Deck height',
    min: -20,
    max: 20,
    column: 'deck_mm',
    csvColumn: 'deck_mm',
    help: 'Piston crown below the cylinder top at TDC; negative when the crown stands proud',
  }).nullable(),
  rotation: choiceField({ label: 'Rotation', choices: ['cw', 'ccw'], column: 'rotation', csvColumn: 'rotation' }),
  advanceDeg: numberField({
    label: 'Specified static advance',
    min: ADVANCE_RANGE_DEG.min,
    max: ADVANCE_RANGE_DEG.max,
    unit: '° BTDC',
    column: 'advance_deg',
    csvColumn: 'specified_advance_deg',
  }).nullable(),
  stops: listField({ label: 'Positive-stop readings', unit: '°', column: 'stops_json' }, stopsSchema).nullable(),
  timingSetDegBTDC: numberField({
    label: 'Timing set (degrees)',
    min: ADVANCE_RANGE_DEG.min,
    max: ADVANCE_RANGE_DEG.max,
    unit: '° BTDC',
    column: 'timing_set_deg_btdc',
    csvColumn: 'timing_set_deg_btdc',
  }).nullable(),
  timingSetMmBTDC: lengthField({
    label: 'Timing set (piston travel)',
    min: TIMING_MM_RANGE.min,
    max: TIMING_MM_RANGE.max,
    column: 'timing_set_mm_btdc',
    csvColumn: 'timing_set_mm_btdc',
  }).nullable(),
  timingCheck: choiceField({ label: 'Timing checked by', choices: TIMING_CHECKS, column: 'timing_check', csvColumn: 'timing_check' }).nullable(),
  timingCheckRpm: numberField({ label: 'Strobe engine speed', min: 100, max: 30000, unit: 'rpm', column: 'timing_check_rpm', csvColumn: 'timing_check_rpm' }).nullable(),
  ports: listField(
    { label: 'Measured ports', unit: 'mm', column: 'ports_json' },
    z
      .array(measuredPortSchema, { error: 'Measured ports must be a list of { name, heightMm }' })
      .max(MAX_BUILD_PORTS, `Measured ports: at most ${MAX_BUILD_PORTS} (allowed 0–${MAX_BUILD_PORTS})`),
  ),
  portTargets: listField(
    { label: 'Port targets', unit: '°', column: 'port_targets_json' },
    z.array(portEventSchema, { error: 'Port targets must be a list of { name, opensCrankDeg, closesCrankDeg }' }).max(MAX_BUILD_PORTS, `Port targets: at most ${MAX_BUILD_PORTS}`),
  ),
  squishMm: lengthField({ label: 'Squish clearance', min: 0, max: 5, column: 'squish_mm', csvColumn: 'squish_mm' }).nullable(),
  otherMeasurements: listField(
    { label: 'Other measurements', column: 'other_measurements_json' },
    z.array(freeMeasurementSchema, { error: 'Other measurements must be a list of { name, value, unit }' }).max(MAX_FREE_MEASUREMENTS, `Other measurements: at most ${MAX_FREE_MEASUREMENTS}`),
  ),
  notes: textField({ label: 'Notes', maxLength: BUILD_NOTES_MAX, column: 'notes', csvColumn: 'notes' }),
});

export type BuildFieldKey = keyof typeof buildFields;
export type BuildFields = { [K in BuildFieldKey]: z.output<(typeof buildFields)[K]['schema']> };
export const BUILD_FIELD_LIST = fieldsOf(buildFields);
export const BUILD_FIELD_KEYS = BUILD_FIELD_LIST.map((f) => f.key) as BuildFieldKey[];
