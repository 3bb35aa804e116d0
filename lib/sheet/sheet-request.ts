import { z } from 'zod';
import { PAPER_NAMES, type PaperName } from './paper';

/**
 * The one schema for a sheet request: the generator form (browser), the preview
 * server action and POST /api/v1/sheets all validate with it. Lengths in mm,
 * angles in degrees. Every message names the field and its allowed range.
 */

export const SHEET_KINDS = ['wheel', 'ring', 'strip', 'scribe', 'check'] as const;
export type SheetKind = (typeof SHEET_KINDS)[number];

export const DIAMETER_RANGE_MM = { min: 20, max: 600 } as const;
export const STRIP_WIDTH_RANGE_MM = { min: 6, max: 40 } as const;
export const PAPER_THICKNESS_RANGE_MM = { min: 0, max: 0.5 } as const;
export const ADVANCE_RANGE_DEG = { min: 0, max: 60 } as const;
export const MAX_ADVANCE_MARKS = 72;
export const MIN_PITCH_RANGE_MM = { min: 0.2, max: 5 } as const;
export const PRINTER_SCALE_RANGE = { min: 0.9, max: 1.1 } as const;
export const MAX_PORT_EVENTS = 12;
export const MAX_SCRIBE_ROWS = 400;

function withUnit(value: number, unit: string): string {
  if (!unit) return String(value);
  return unit.startsWith('°') ? `${value}${unit}` : `${value} ${unit}`;
}

function numberIn(label: string, field: string, min: number, max: number, unit: string) {
  const range = `${min}–${withUnit(max, unit)}`;
  return z
    .number({ error: `${label} (${field}) must be a number, ${range}` })
    .min(min, `${label} (${field}) must be at least ${withUnit(min, unit)} (allowed ${range})`)
    .max(max, `${label} (${field}) must be at most ${withUnit(max, unit)} (allowed ${range})`);
}

const crankDeg = (label: string, field: string) => numberIn(label, field, 0, 360, '°');
const btdcDeg = (label: string, field: string) =>
  numberIn(label, field, ADVANCE_RANGE_DEG.min, ADVANCE_RANGE_DEG.max, '° BTDC');

function choice<const T extends readonly [string, ...string[]]>(label: string, field: string, values: T) {
  return z.enum(values, { error: `${label} (${field}) must be one of: ${values.join(', ')}` });
}

export const portEventSchema = z.object({
  name: z
    .string({ error: 'Port name must be text, 1–24 characters' })
    .trim()
    .min(1, 'Port name must not be empty (1–24 characters)')
    .max(24, 'Port name must be at most 24 characters'),
  opensCrankDeg: crankDeg('Port opening angle', 'opensCrankDeg'),
  closesCrankDeg: crankDeg('Port closing angle', 'closesCrankDeg'),
});
export type PortEvent = z.infer<typeof portEventSchema>;

export const sheetRequestSchema = z
  .object({
    kind: choice('Sheet kind', 'kind', SHEET_KINDS),
    diameterMm: numberIn('Diameter', 'diameterMm', DIAMETER_RANGE_MM.min, DIAMETER_RANGE_MM.max, 'mm').optional(),
    hubHoleMm: numberIn('Hub hole', 'hubHoleMm', 0, DIAMETER_RANGE_MM.max, 'mm').default(0),
    innerDiameterMm: numberIn('Inner diameter', 'innerDiameterMm', DIAMETER_RANGE_MM.min, DIAMETER_RANGE_MM.max, 'mm').optional(),
    outerDiameterMm: numberIn('Outer diameter', 'outerDiameterMm', DIAMETER_RANGE_MM.min, DIAMETER_RANGE_MM.max, 'mm').optional(),
    paperThicknessMm: numberIn(
      'Paper thickness',
      'paperThicknessMm',
      PAPER_THICKNESS_RANGE_MM.min,
      PAPER_THICKNESS_RANGE_MM.max,
      'mm',
    ).default(0.1),
    stripWidthMm: numberIn('Strip width', 'stripWidthMm', STRIP_WIDTH_RANGE_MM.min, STRIP_WIDTH_RANGE_MM.max, 'mm').default(12),
    seamCrankDeg: crankDeg('Seam position', 'seamCrankDeg').default(180),
    windowCrankDeg: z
      .tuple([crankDeg('Window start', 'windowCrankDeg'), crankDeg('Window end', 'windowCrankDeg')], {
        error: 'Window (windowCrankDeg) must be two crank angles [from, to], each 0–360°',
      })
      .optional(),
    fromDeg: numberIn('Scribe chart start', 'fromDeg', 0, 180, '°').default(0),
    toDeg: numberIn('Scribe chart end', 'toDeg', 0, 180, '°').default(40),
    stepDeg: numberIn('Scribe chart step', 'stepDeg', 0.1, 10, '°').default(1),
    rotation: choice('Rotation', 'rotation', ['cw', 'ccw']).default('cw'),
    carrier: choice('Scale carrier', 'carrier', ['rotating', 'stationary']).default('rotating'),
    numbering: choice('Numbering', 'numbering', ['split', 'full']).default('split'),
    advanceMarksDeg: z
      .array(btdcDeg('Advance mark', 'advanceMarksDeg'), {
        error: 'Advance marks (advanceMarksDeg) must be a list of angles, 0–60° BTDC',
      })
      .max(MAX_ADVANCE_MARKS, `Advance marks (advanceMarksDeg): at most ${MAX_ADVANCE_MARKS} angles`)
      .default([]),
    advanceBandDeg: z
      .tuple([btdcDeg('Advance band start', 'advanceBandDeg'), btdcDeg('Advance band end', 'advanceBandDeg')], {
        error: 'Advance band (advanceBandDeg) must be two angles [from, to], each 0–60° BTDC',
      })
      .optional(),
    portEvents: z
      .array(portEventSchema, { error: 'Port events (portEvents) must be a list of { name, opensCrankDeg, closesCrankDeg }' })
      .max(MAX_PORT_EVENTS, `Port events (portEvents): at most ${MAX_PORT_EVENTS}`)
      .default([]),
    minPitchMm: numberIn('Minimum legible pitch', 'minPitchMm', MIN_PITCH_RANGE_MM.min, MIN_PITCH_RANGE_MM.max, 'mm').default(0.6),
    paper: choice('Paper', 'paper', PAPER_NAMES as [PaperName, ...PaperName[]]).default('A4'),
    orientation: choice('Orientation', 'orientation', ['portrait', 'landscape']).default('portrait'),
    printerScaleX: numberIn('Printer scale X', 'printerScaleX', PRINTER_SCALE_RANGE.min, PRINTER_SCALE_RANGE.max, '').default(1),
    printerScaleY: numberIn('Printer scale Y', 'printerScaleY', PRINTER_SCALE_RANGE.min, PRINTER_SCALE_RANGE.max, '').default(1),
    printerProfileName: z.string().trim().max(60, 'Printer profile name must be at most 60 characters').optional(),
    title: z
      .string({ error: 'Title (title) must be text, up to 80 characters' })
      .trim()
      .max(80, 'Title (title) must be at most 80 characters')
      .default(''),
    note: z.string().trim().max(200, 'Note (note) must be at most 200 characters').optional(),
    format: choice('Format', 'format', ['svg', 'pdf']).default('pdf'),
  })
  .superRefine((req, ctx) => {
    const need = (field: 'diameterMm' | 'innerDiameterMm' | 'outerDiameterMm', label: string) => {
      if (req[field] === undefined)
        ctx.addIssue({
          code: 'custom',
          path: [field],
          message: `${label} (${field}) is required for a ${req.kind} sheet (allowed ${DIAMETER_RANGE_MM.min}–${DIAMETER_RANGE_MM.max} mm)`,
        });
    };
    if (req.kind === 'wheel' || req.kind === 'strip' || req.kind === 'scribe') need('diameterMm', 'Diameter');
    if (req.kind === 'ring') {
      need('innerDiameterMm', 'Inner diameter');
      need('outerDiameterMm', 'Outer diameter');
      if (req.innerDiameterMm !== undefined && req.outerDiameterMm !== undefined && req.innerDiameterMm >= req.outerDiameterMm)
        ctx.addIssue({
          code: 'custom',
          path: ['innerDiameterMm'],
          message: `Inner diameter (innerDiameterMm) must be smaller than the outer diameter (${req.outerDiameterMm} mm)`,
        });
    }
    if (req.kind === 'wheel' && req.diameterMm !== undefined && req.hubHoleMm >= req.diameterMm)
      ctx.addIssue({
        code: 'custom',
        path: ['hubHoleMm'],
        message: `Hub hole (hubHoleMm) must be smaller than the disc diameter (0 to under ${req.diameterMm} mm)`,
      });
    if (req.kind === 'scribe') {
      if (req.toDeg < req.fromDeg)
        ctx.addIssue({ code: 'custom', path: ['toDeg'], message: `Scribe chart end (toDeg) must not be below the start (${req.fromDeg}°)` });
      else if ((req.toDeg - req.fromDeg) / req.stepDeg + 1 > MAX_SCRIBE_ROWS)
        ctx.addIssue({
          code: 'custom',
          path: ['stepDeg'],
          message: `Scribe chart step (stepDeg) gives more than ${MAX_SCRIBE_ROWS} rows: widen the step or narrow the range`,
        });
    }
  });

export type SheetRequestInput = z.input<typeof sheetRequestSchema>;
export type SheetRequest = z.output<typeof sheetRequestSchema>;

export type FieldIssue = { path: string; message: string };

/** Flattens zod issues to the API's `{ path, message }` list (`path` joined with dots). */
export function toFieldIssues(error: z.ZodError): FieldIssue[] {
  return error.issues.map((issue) => ({ path: issue.path.map(String).join('.') || '(body)', message: issue.message }));
}
