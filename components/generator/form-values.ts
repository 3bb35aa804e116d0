import { UNIT_PARAM } from '@/lib/sheet-link-params';
import type { PaperName } from '@/lib/sheet/paper';
import type { PortEvent, SheetKind, SheetRequestInput } from '@/lib/sheet/sheet-request';
import type { LengthUnit } from '@/lib/fields/length';
import { parseNumberList } from '@/lib/text/number-list';

/**
 * What the generator form holds, field for field named after the sheet request
 * schema's keys. Two differences from the request: the advance marks are the
 * text the user types ("16, 17, 18") and blank pairs mean "none". Lengths are
 * held in mm like the request; the mm/in toggle only changes how the length
 * fields show them. `toSheetRequestInput` turns it into the request the shared
 * schema validates. Reading a query string back into the form (it checks each value with the schema) is
 * form-values-from-query.ts, so the browser's form loads no schema until it validates.
 */

export type { LengthUnit };

export type GeneratorFormValues = {
  lengthUnit: LengthUnit;
  kind: SheetKind;
  diameterMm: number;
  hubHoleMm: number;
  innerDiameterMm: number;
  outerDiameterMm: number;
  paperThicknessMm: number;
  stripWidthMm: number;
  seamCrankDeg: number;
  windowCrankDeg: [number, number];
  fromDeg: number;
  toDeg: number;
  stepDeg: number;
  rotation: 'cw' | 'ccw';
  carrier: 'rotating' | 'stationary';
  numbering: 'split' | 'full';
  advanceMarksDeg: string;
  advanceBandDeg: [number, number];
  /** Blank (NaN) for none. */
  targetAdvanceDeg: number;
  strobeReadable: boolean;
  portEvents: PortEvent[];
  minPitchMm: number;
  paper: PaperName;
  orientation: 'portrait' | 'landscape';
  title: string;
  note: string;
};

type RequestField = Exclude<keyof GeneratorFormValues, 'lengthUnit'>;
const SCALE_FIELDS: RequestField[] = ['rotation', 'carrier', 'numbering', 'advanceMarksDeg', 'advanceBandDeg', 'targetAdvanceDeg', 'strobeReadable', 'portEvents', 'minPitchMm'];
const COMMON_FIELDS: RequestField[] = ['kind', 'paper', 'orientation', 'title', 'note'];

/** The fields each kind of sheet uses; the others are not sent, so a stale hidden value cannot block a sheet. */
export const FIELDS_BY_KIND: Record<SheetKind, RequestField[]> = {
  wheel: [...COMMON_FIELDS, 'diameterMm', 'hubHoleMm', ...SCALE_FIELDS],
  ring: [...COMMON_FIELDS, 'innerDiameterMm', 'outerDiameterMm', ...SCALE_FIELDS],
  strip: [...COMMON_FIELDS, 'diameterMm', 'paperThicknessMm', 'stripWidthMm', 'seamCrankDeg', 'windowCrankDeg', ...SCALE_FIELDS],
  scribe: [...COMMON_FIELDS, 'diameterMm', 'fromDeg', 'toDeg', 'stepDeg'],
  check: COMMON_FIELDS,
};

export function usesField(kind: SheetKind, field: RequestField): boolean {
  return FIELDS_BY_KIND[kind].includes(field);
}

export const DEFAULT_FORM_VALUES: GeneratorFormValues = {
  lengthUnit: 'mm',
  kind: 'wheel',
  diameterMm: 120,
  hubHoleMm: 0,
  innerDiameterMm: 112,
  outerDiameterMm: 150,
  paperThicknessMm: 0.1,
  stripWidthMm: 12,
  seamCrankDeg: 180,
  windowCrankDeg: [Number.NaN, Number.NaN],
  fromDeg: 0,
  toDeg: 40,
  stepDeg: 1,
  rotation: 'cw',
  carrier: 'rotating',
  numbering: 'split',
  advanceMarksDeg: '',
  advanceBandDeg: [Number.NaN, Number.NaN],
  targetAdvanceDeg: Number.NaN,
  strobeReadable: false,
  portEvents: [],
  minPitchMm: 0.6,
  paper: 'A4',
  orientation: 'portrait',
  title: '',
  note: '',
};

function pairOrNone(pair: [number, number] | undefined): [number, number] | undefined {
  if (!pair) return undefined;
  const [from, to] = pair;
  const blank = (value: number) => value === undefined || value === null || Number.isNaN(value);
  return blank(from) && blank(to) ? undefined : [from, to];
}

/** The sheet request for the shared schema: only the chosen kind's fields, parsed lists. */
export function toSheetRequestInput(values: GeneratorFormValues): SheetRequestInput {
  const request: Record<string, unknown> = {};
  for (const field of FIELDS_BY_KIND[values.kind] ?? COMMON_FIELDS) {
    const value = values[field];
    if (field === 'advanceMarksDeg') request[field] = parseNumberList(String(value ?? ''));
    else if (field === 'windowCrankDeg' || field === 'advanceBandDeg') request[field] = pairOrNone(value as [number, number]);
    else if (field === 'note') request[field] = String(value ?? '').trim() || undefined;
    // Blank (NaN from valueAsNumber) means no target; any number typed goes to the schema, which checks its range.
    else if (field === 'targetAdvanceDeg') request[field] = typeof value === 'number' && !Number.isNaN(value) ? value : undefined;
    else request[field] = value;
    if (request[field] === undefined) delete request[field];
  }
  return request as SheetRequestInput;
}

const QUERY_ORDER: RequestField[] = [
  'kind',
  'diameterMm',
  'hubHoleMm',
  'innerDiameterMm',
  'outerDiameterMm',
  'paperThicknessMm',
  'stripWidthMm',
  'seamCrankDeg',
  'windowCrankDeg',
  'fromDeg',
  'toDeg',
  'stepDeg',
  'carrier',
  'rotation',
  'numbering',
  'advanceMarksDeg',
  'advanceBandDeg',
  'targetAdvanceDeg',
  'strobeReadable',
  'portEvents',
  'minPitchMm',
  'paper',
  'orientation',
  'title',
  'note',
];

function queryValue(values: GeneratorFormValues, field: RequestField): string | null {
  const value = values[field];
  if (typeof value === 'number') return Number.isFinite(value) ? String(value) : null;
  if (field === 'windowCrankDeg' || field === 'advanceBandDeg') {
    const pair = pairOrNone(value as [number, number]);
    return pair && pair.every(Number.isFinite) ? pair.join(',') : null;
  }
  if (field === 'portEvents') return (value as PortEvent[]).length > 0 ? JSON.stringify(value) : null;
  const text = String(value ?? '').trim();
  return text === '' ? null : text;
}

/**
 * The whole form as the sheet maker's query string (read back by `formValuesFromQuery`): lengths in mm (as the
 * form holds them) with the unit on screen beside them, values left at their defaults left out, except the kind, its
 * diameters (the figure a reader of the link looks for) and the carrier (a flange ring's defaults differently);
 * blank fields left out.
 */
const DIAMETER_FIELDS: RequestField[] = ['diameterMm', 'innerDiameterMm', 'outerDiameterMm'];

export function sheetQuery(values: GeneratorFormValues): string {
  const params = new URLSearchParams();
  for (const field of QUERY_ORDER) {
    const text = queryValue(values, field);
    if (text === null) continue;
    const always = field === 'kind' || field === 'carrier' || (DIAMETER_FIELDS.includes(field) && usesField(values.kind, field));
    if (!always && text === queryValue(DEFAULT_FORM_VALUES, field)) continue;
    params.set(field, text);
  }
  if (values.lengthUnit === 'in') params.set(UNIT_PARAM, 'in');
  return params.toString();
}
