import { z } from 'zod';
import { choiceField, flagField, lengthField, listField, numberField, textField } from '../fields/builders';
import { defineFields, shapeOf } from '../fields/field';
import { PAPER_NAMES, type PaperName } from './paper';
import { ADVANCE_RANGE_DEG, DIAMETER_RANGE_MM, MAX_ADVANCE_MARKS, MAX_PORT_EVENTS, PRINTER_SCALE_RANGE, STRIP_WIDTH_RANGE_MM } from './sheet-limits';

/**
 * The fields of a sheet request, declared once: the schema (sheet-request.ts),
 * the generator form's labels and its mm/in lengths read this table.
 * Lengths in mm, angles in degrees.
 */

export const SHEET_KINDS = ['wheel', 'ring', 'strip', 'scribe', 'check'] as const;
export type SheetKind = (typeof SHEET_KINDS)[number];

/** What the printer makes of one millimetre, per axis; the sheet request carries them, a printer profile keeps them. */
export const printerScaleFields = defineFields({
  printerScaleX: numberField({ label: 'Printer scale X', ...PRINTER_SCALE_RANGE }),
  printerScaleY: numberField({ label: 'Printer scale Y', ...PRINTER_SCALE_RANGE }),
});

const CRANK_RANGE_DEG = { min: 0, max: 360, unit: '°' } as const;
const BTDC_RANGE_DEG = { ...ADVANCE_RANGE_DEG, unit: '° BTDC' } as const;

export const portEventFields = defineFields({
  name: textField({ label: 'Port name', minLength: 1, maxLength: 24 }),
  opensCrankDeg: numberField({ label: 'Port opening angle', ...CRANK_RANGE_DEG }),
  closesCrankDeg: numberField({ label: 'Port closing angle', ...CRANK_RANGE_DEG }),
});

export const portEventSchema = z.object(shapeOf(portEventFields));
export type PortEvent = z.infer<typeof portEventSchema>;

type Range = { min: number; max: number; unit: string };
/** Two angles [from, to], each with its own label in its messages. */
const anglePair = (range: Range) => (from: string, to: string, error: string) =>
  z.tuple([numberField({ label: from, ...range }).schema, numberField({ label: to, ...range }).schema], { error });
const crankPair = anglePair(CRANK_RANGE_DEG);
const btdcPair = anglePair(BTDC_RANGE_DEG);

export const sheetRequestFields = defineFields({
  kind: choiceField({ label: 'Sheet kind', choices: SHEET_KINDS }),
  diameterMm: lengthField({ label: 'Diameter', ...DIAMETER_RANGE_MM }).optional(),
  hubHoleMm: lengthField({ label: 'Hub hole', min: 0, max: DIAMETER_RANGE_MM.max }).default(0),
  innerDiameterMm: lengthField({ label: 'Inner diameter', ...DIAMETER_RANGE_MM }).optional(),
  outerDiameterMm: lengthField({ label: 'Outer diameter', ...DIAMETER_RANGE_MM }).optional(),
  // Thickness and pitch are not measured with calipers: they stay in mm whatever unit the form shows lengths in.
  paperThicknessMm: numberField({ label: 'Paper thickness', min: 0, max: 0.5, unit: 'mm' }).default(0.1),
  stripWidthMm: lengthField({ label: 'Strip width', ...STRIP_WIDTH_RANGE_MM }).default(12),
  seamCrankDeg: numberField({ label: 'Seam position', ...CRANK_RANGE_DEG }).default(180),
  windowCrankDeg: listField(
    { label: 'Window', unit: '°' },
    crankPair('Window start', 'Window end', 'Window must be two crank angles [from, to], each 0–360°'),
  ).optional(),
  fromDeg: numberField({ label: 'Scribe chart start', min: 0, max: 180, unit: '°' }).default(0),
  toDeg: numberField({ label: 'Scribe chart end', min: 0, max: 180, unit: '°' }).default(40),
  stepDeg: numberField({ label: 'Scribe chart step', min: 0.1, max: 10, unit: '°' }).default(1),
  rotation: choiceField({ label: 'Rotation', choices: ['cw', 'ccw'] }).default('cw'),
  carrier: choiceField({ label: 'Scale carrier', choices: ['rotating', 'stationary'] }).default('rotating'),
  numbering: choiceField({ label: 'Numbering', choices: ['split', 'full'] }).default('split'),
  advanceMarksDeg: listField(
    { label: 'Advance marks', unit: '° BTDC' },
    z
      .array(numberField({ label: 'Advance mark', ...BTDC_RANGE_DEG }).schema, {
        error: 'Advance marks must be a list of angles, 0–60° BTDC',
      })
      .max(MAX_ADVANCE_MARKS, `Advance marks: at most ${MAX_ADVANCE_MARKS} angles`),
  ).default([]),
  advanceBandDeg: listField(
    { label: 'Advance band', unit: '° BTDC' },
    btdcPair('Advance band start', 'Advance band end', 'Advance band must be two angles [from, to], each 0–60° BTDC'),
  ).optional(),
  // The static advance the engine is set to (a template's or build's, or the user's): drawn heavier and named.
  targetAdvanceDeg: numberField({ label: 'Target advance', ...BTDC_RANGE_DEG }).optional(),
  // For timing with a strobe on a running engine: big figures through the advance range on a white ground (strobe.ts).
  strobeReadable: flagField({ label: 'Strobe-readable' }).default(false),
  portEvents: listField(
    { label: 'Port events' },
    z
      .array(portEventSchema, { error: 'Port events must be a list of { name, opensCrankDeg, closesCrankDeg }' })
      .max(MAX_PORT_EVENTS, `Port events: at most ${MAX_PORT_EVENTS}`),
  ).default([]),
  minPitchMm: numberField({ label: 'Minimum legible pitch', min: 0.2, max: 5, unit: 'mm' }).default(0.6),
  paper: choiceField({ label: 'Paper', choices: PAPER_NAMES as [PaperName, ...PaperName[]] }).default('A4'),
  orientation: choiceField({ label: 'Orientation', choices: ['portrait', 'landscape'] }).default('portrait'),
  printerScaleX: printerScaleFields.printerScaleX.default(1),
  printerScaleY: printerScaleFields.printerScaleY.default(1),
  printerProfileName: textField({ label: 'Printer profile name', maxLength: 60 }).optional(),
  title: textField({ label: 'Title', maxLength: 80 }).default(''),
  note: textField({ label: 'Note', maxLength: 200 }).optional(),
  format: choiceField({ label: 'Format', choices: ['svg', 'pdf'] }).default('pdf'),
});
