import type { z } from 'zod';
import {
  MAX_ADVANCE_MARKS,
  MAX_PORT_EVENTS,
  portEventSchema,
  sheetRequestSchema,
  type PortEvent,
  type SheetRequestInput,
} from './sheet/sheet-request';

/**
 * Reads generator defaults from a link's query string (the calculators and the
 * template library link to `/?kind=wheel&diameterMm=120&advanceMarksDeg=16,18`).
 * Every value is checked on its own with the sheet request schema's field; a bad
 * one is dropped and reported, never thrown, so a mangled link still opens the page.
 */

export type SearchParamsLike = URLSearchParams | Record<string, string | string[] | undefined>;
export type IgnoredParam = { param: string; message: string };
export type Prefill = { values: Partial<SheetRequestInput>; ignored: IgnoredParam[] };

const NUMBER_PARAMS = [
  'diameterMm',
  'hubHoleMm',
  'innerDiameterMm',
  'outerDiameterMm',
  'paperThicknessMm',
  'stripWidthMm',
  'seamCrankDeg',
  'fromDeg',
  'toDeg',
  'stepDeg',
  'minPitchMm',
] as const;
const CHOICE_PARAMS = ['kind', 'rotation', 'carrier', 'numbering', 'paper', 'orientation'] as const;
const TEXT_PARAMS = ['title', 'note'] as const;
const PAIR_PARAMS = ['windowCrankDeg', 'advanceBandDeg'] as const;

const MAX_PARAM_CHARS = 4000;
const shape = sheetRequestSchema.shape;

function readParam(params: SearchParamsLike, key: string): string | undefined {
  const raw = params instanceof URLSearchParams ? (params.get(key) ?? undefined) : params[key];
  const value = Array.isArray(raw) ? raw[0] : raw;
  return value === undefined ? undefined : value.slice(0, MAX_PARAM_CHARS);
}

/** A strict decimal number: "", "1e3", "0x10" and "12abc" are not numbers here. */
export function parseDecimal(text: string): number {
  const trimmed = text.trim();
  return /^[+-]?(\d+\.?\d*|\.\d+)$/.test(trimmed) ? Number(trimmed) : Number.NaN;
}

/** "16, 17,18" → [16, 17, 18]; blanks between commas are skipped, bad entries become NaN. */
export function parseNumberList(text: string): number[] {
  return text
    .split(',')
    .map((part) => part.trim())
    .filter((part) => part !== '')
    .map(parseDecimal);
}

function firstMessage(error: z.ZodError): string {
  return error.issues[0]?.message ?? 'not valid';
}

export function prefillFromSearchParams(params: SearchParamsLike): Prefill {
  const values: Record<string, unknown> = {};
  const ignored: IgnoredParam[] = [];
  const accept = (param: string, schema: z.ZodType, candidate: unknown) => {
    const result = schema.safeParse(candidate);
    if (result.success) values[param] = result.data;
    else ignored.push({ param, message: firstMessage(result.error) });
  };

  for (const param of NUMBER_PARAMS) {
    const text = readParam(params, param);
    if (text !== undefined) accept(param, shape[param], parseDecimal(text));
  }
  for (const param of CHOICE_PARAMS) {
    const text = readParam(params, param);
    if (text !== undefined) accept(param, shape[param], text.trim());
  }
  for (const param of TEXT_PARAMS) {
    const text = readParam(params, param);
    if (text !== undefined) accept(param, shape[param], text);
  }
  for (const param of PAIR_PARAMS) {
    const text = readParam(params, param);
    if (text !== undefined) accept(param, shape[param], parseNumberList(text));
  }
  readAdvanceMarks(params, values, ignored);
  readPortEvents(params, values, ignored);
  return { values: values as Partial<SheetRequestInput>, ignored };
}

/** Keeps the valid angles of the list and reports the others. */
function readAdvanceMarks(params: SearchParamsLike, values: Record<string, unknown>, ignored: IgnoredParam[]) {
  const text = readParam(params, 'advanceMarksDeg');
  if (text === undefined) return;
  const element = shape.advanceMarksDeg.unwrap().element;
  const kept: number[] = [];
  for (const angle of parseNumberList(text)) {
    const result = element.safeParse(angle);
    if (result.success) kept.push(result.data);
    else ignored.push({ param: 'advanceMarksDeg', message: firstMessage(result.error) });
  }
  if (kept.length > MAX_ADVANCE_MARKS)
    ignored.push({ param: 'advanceMarksDeg', message: `Advance marks (advanceMarksDeg): kept the first ${MAX_ADVANCE_MARKS}` });
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
    ignored.push({ param: 'portEvents', message: 'Port events (portEvents) are not valid JSON' });
    return;
  }
  if (!Array.isArray(json)) {
    ignored.push({ param: 'portEvents', message: 'Port events (portEvents) must be a list of { name, opensCrankDeg, closesCrankDeg }' });
    return;
  }
  const kept: PortEvent[] = [];
  for (const entry of json) {
    const result = portEventSchema.safeParse(entry);
    if (result.success) kept.push(result.data);
    else ignored.push({ param: 'portEvents', message: firstMessage(result.error) });
  }
  if (kept.length > MAX_PORT_EVENTS)
    ignored.push({ param: 'portEvents', message: `Port events (portEvents): kept the first ${MAX_PORT_EVENTS}` });
  values.portEvents = kept.slice(0, MAX_PORT_EVENTS);
}
