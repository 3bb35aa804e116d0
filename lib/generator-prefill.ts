import type { z } from 'zod';
import { fieldsOf, type Field, type FieldKind } from './fields/field';
import {
  MAX_ADVANCE_MARKS,
  MAX_PORT_EVENTS,
  portEventSchema,
  sheetRequestSchema,
  type PortEvent,
  type SheetRequestInput,
} from './sheet/sheet-request';
import { sheetRequestFields } from './sheet/sheet-request-fields';
import { parseDecimal, parseNumberList } from './text/number-list';

/**
 * Reads generator defaults from a link's query string (the calculators and the
 * template library link to `/?kind=wheel&diameterMm=120&advanceMarksDeg=16,18`).
 * Every value is checked on its own with the sheet request schema's field; a bad
 * one is dropped and reported, never thrown, so a mangled link still opens the page.
 */

export type SearchParamsLike = URLSearchParams | Record<string, string | string[] | undefined>;
export type IgnoredParam = { param: string; message: string };
export type Prefill = { values: Partial<SheetRequestInput>; ignored: IgnoredParam[] };

/** The printer's scale and profile and the file format are the download's business, never a link's. */
const NOT_FROM_LINKS = new Set(['printerScaleX', 'printerScaleY', 'printerProfileName', 'format']);
/** Lists with a reader of their own (each entry kept or reported on its own). */
const OWN_READERS = new Set(['advanceMarksDeg', 'portEvents']);
const LINK_FIELDS = fieldsOf(sheetRequestFields).filter((field) => !NOT_FROM_LINKS.has(field.key));
const ofKind = (...kinds: FieldKind[]): Field[] => LINK_FIELDS.filter((field) => kinds.includes(field.kind) && !OWN_READERS.has(field.key));

const NUMBER_FIELDS = ofKind('number', 'length');
const CHOICE_FIELDS = ofKind('choice');
const TEXT_FIELDS = ofKind('text');
/** The window and the advance band: two numbers, "320,10". */
const PAIR_FIELDS = ofKind('list');
/** Yes/no options: "true" or "false" (what the sheet maker's own links write). */
const FLAG_FIELDS = ofKind('flag');

const MAX_PARAM_CHARS = 4000;

function readParam(params: SearchParamsLike, key: string): string | undefined {
  const raw = params instanceof URLSearchParams ? (params.get(key) ?? undefined) : params[key];
  const value = Array.isArray(raw) ? raw[0] : raw;
  return value === undefined ? undefined : value.slice(0, MAX_PARAM_CHARS);
}

function firstMessage(error: z.ZodError): string {
  return error.issues[0]?.message ?? 'not valid';
}

export function prefillFromSearchParams(params: SearchParamsLike): Prefill {
  const values: Record<string, unknown> = {};
  const ignored: IgnoredParam[] = [];
  const accept = (fields: Field[], read: (text: string) => unknown) => {
    for (const field of fields) {
      const text = readParam(params, field.key);
      if (text === undefined) continue;
      const result = field.schema.safeParse(read(text));
      if (result.success) values[field.key] = result.data;
      else ignored.push({ param: field.key, message: firstMessage(result.error) });
    }
  };
  accept(NUMBER_FIELDS, parseDecimal);
  accept(CHOICE_FIELDS, (text) => text.trim());
  accept(TEXT_FIELDS, (text) => text);
  accept(PAIR_FIELDS, parseNumberList);
  accept(FLAG_FIELDS, (text) => (text.trim() === 'true' ? true : text.trim() === 'false' ? false : text));
  readAdvanceMarks(params, values, ignored);
  readPortEvents(params, values, ignored);
  return { values: values as Partial<SheetRequestInput>, ignored };
}

/** Keeps the valid angles of the list and reports the others. */
function readAdvanceMarks(params: SearchParamsLike, values: Record<string, unknown>, ignored: IgnoredParam[]) {
  const text = readParam(params, 'advanceMarksDeg');
  if (text === undefined) return;
  const element = sheetRequestSchema.shape.advanceMarksDeg.unwrap().element;
  const kept: number[] = [];
  for (const angle of parseNumberList(text)) {
    const result = element.safeParse(angle);
    if (result.success) kept.push(result.data);
    else ignored.push({ param: 'advanceMarksDeg', message: firstMessage(result.error) });
  }
  if (kept.length > MAX_ADVANCE_MARKS)
    ignored.push({ param: 'advanceMarksDeg', message: `${sheetRequestFields.advanceMarksDeg.label}: kept the first ${MAX_ADVANCE_MARKS}` });
  values.advanceMarksDeg = kept.slice(0, MAX_ADVANCE_MARKS);
}

/** portEvents is JSON: `[{"name":"Exhaust","opensCrankDeg":95,"closesCrankDeg":265}]`. */
function readPortEvents(params: SearchParamsLike, values: Record<string, unknown>, ignored: IgnoredParam[]) {
  const text = readParam(params, 'portEvents');
  if (text === undefined) return;
  let json: unknown;
  try {
    json = JSON.parse(text);
  } catch {
    ignored.push({ param: 'portEvents', message: `${sheetRequestFields.portEvents.label} are not valid JSON` });
    return;
  }
  if (!Array.isArray(json)) {
    ignored.push({ param: 'portEvents', message: `${sheetRequestFields.portEvents.label} must be a list of { name, opensCrankDeg, closesCrankDeg }` });
    return;
  }
  const kept: PortEvent[] = [];
  for (const entry of json) {
    const result = portEventSchema.safeParse(entry);
    if (result.success) kept.push(result.data);
    else ignored.push({ param: 'portEvents', message: firstMessage(result.error) });
  }
  if (kept.length > MAX_PORT_EVENTS)
    ignored.push({ param: 'portEvents', message: `${sheetRequestFields.portEvents.label}: kept the first ${MAX_PORT_EVENTS}` });
  values.portEvents = kept.slice(0, MAX_PORT_EVENTS);
}
