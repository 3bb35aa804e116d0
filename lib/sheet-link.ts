import { tdcNoteText } from './engine/wheel-links';
import { parseDecimal, parseNumberList } from './text/number-list';
import { ADD_MARK_PARAM, INSTRUCTION_PARAMS, KEEP_PARAM, TDC_CRANK_PARAM, TDC_STOP_PARAM } from './sheet-link-params';
import { MAX_ADVANCE_MARKS } from './sheet/sheet-request';

/**
 * What the sheet maker shows for a URL: the sheet maker's form lives in its query string, and the last sheet a
 * browser made is kept (a cookie holding that same query string). Three cases:
 * - a plain link or a reload (`/?kind=wheel&diameterMm=128.4…`) shows exactly what it says;
 * - the bare `/` brings the last sheet back, so the header link never loses what was typed;
 * - a link from a calculator or a template (`keep=1`) adds its values to the last sheet: its fields replace those
 *   fields only, an added advance mark joins the marks, and a TDC check becomes a note written for the numbering
 *   the sheet ends up with.
 * Instruction parameters (lib/sheet-link-params.ts) never survive into the result.
 */

export type ResolvedSheetLink = { params: URLSearchParams; notices: string[] };

const MAX_NOTE_CHARS = 200;
const TDC_NOTE = /^(True TDC reads|TDC checked)/;

function withoutInstructions(params: URLSearchParams): URLSearchParams {
  const copy = new URLSearchParams(params);
  for (const name of INSTRUCTION_PARAMS) copy.delete(name);
  return copy;
}

const KINDS_WITH_SCALE = ['wheel', 'ring', 'strip'];

export function resolveSheetLink(link: URLSearchParams, stored: URLSearchParams | null): ResolvedSheetLink {
  const notices: string[] = [];
  if ([...link.keys()].length === 0) {
    if (stored && [...stored.keys()].length > 0) return { params: withoutInstructions(stored), notices: ['Your last sheet is back as you left it.'] };
    return { params: new URLSearchParams(), notices };
  }
  const keep = link.get(KEEP_PARAM) === '1' && stored !== null;
  const params = keep ? withoutInstructions(stored) : new URLSearchParams();
  const linked = withoutInstructions(link);
  for (const [name, value] of linked) params.set(name, value);
  if (keep) notices.push('The link’s values were added to your last sheet; everything else is as you left it.');

  addAdvanceMark(params, link.get(ADD_MARK_PARAM), notices);
  if (params.has('portEvents') && !KINDS_WITH_SCALE.includes(params.get('kind') ?? 'wheel')) params.set('kind', 'wheel');
  addTdcNote(params, link, notices);
  return { params, notices };
}

function addAdvanceMark(params: URLSearchParams, text: string | null, notices: string[]) {
  if (text === null) return;
  const mark = parseDecimal(text);
  if (!Number.isFinite(mark)) return;
  const marks = parseNumberList(params.get('advanceMarksDeg') ?? '').filter(Number.isFinite);
  if (marks.includes(mark)) return;
  if (marks.length >= MAX_ADVANCE_MARKS) {
    notices.push(`${mark}° BTDC was not added: the sheet already has ${MAX_ADVANCE_MARKS} advance marks.`);
    return;
  }
  params.set('advanceMarksDeg', [...marks, mark].join(','));
  if (marks.length > 0) notices.push(`${mark}° BTDC was added to the advance marks you had.`);
}

function addTdcNote(params: URLSearchParams, link: URLSearchParams, notices: string[]) {
  const crankText = link.get(TDC_CRANK_PARAM);
  const stopText = link.get(TDC_STOP_PARAM);
  if (crankText === null || stopText === null) return;
  const tdcCrankOrderDeg = parseDecimal(crankText);
  const stopAngleDeg = parseDecimal(stopText);
  if (!(tdcCrankOrderDeg >= 0 && tdcCrankOrderDeg <= 360 && stopAngleDeg >= 0 && stopAngleDeg < 90)) return;
  const numbering = params.get('numbering') === 'full' ? 'full' : 'split';
  const tdcNote = tdcNoteText({ tdcCrankOrderDeg, stopAngleDeg }, numbering);
  const existing = (params.get('note') ?? '').trim();
  // An earlier TDC note is replaced; another note is kept before it when both fit.
  const combined = existing && !TDC_NOTE.test(existing) ? `${existing}; ${tdcNote}` : tdcNote;
  params.set('note', combined.length <= MAX_NOTE_CHARS ? combined : tdcNote.slice(0, MAX_NOTE_CHARS));
  notices.push(`The TDC note is written for this sheet’s ${numbering === 'full' ? 'full (0–359)' : 'split (0–180 BTDC/ATDC)'} numbering.`);
}
