import { windowSpanDeg } from './strip-layout';
import type { SheetKind, SheetRequest } from './sheet-request';
import { describeCorrection } from './printer-correction';
import type { GraduationLevel } from './drawing';
import { btdcToCrankDeg, wheelAngleDeg } from './scale-direction';
import { formatMm } from '@/lib/format/number-format';

/** The words printed on every sheet: title block lines, the print line, cautions and the "which way" note. */

export const PRINT_AT_100 = 'Print at 100 % / actual size — turn off fit-to-page';

/** The cautions (DEVELOPERS.md, "Cautions"), one list for every sheet and the sheet maker's panel. */
export const CAUTION_LINES = [
  'Take the plug lead off (or the battery out) before turning the engine.',
  'Turn a positive stop by hand only and take it out before starting.',
  'Keep hands, hair and clothes clear of the flywheel and fan when timing with a strobe.',
  'Run engines outdoors or with ventilation.',
  'Too much advance causes detonation and can hole a piston.',
] as const;
export const MANUAL_FIRST = 'The engine maker’s manual and local regulations come first.';

export const CAUTIONS = `Safety: ${CAUTION_LINES.join(' ')} ${MANUAL_FIRST}`;

const KIND_NAMES: Record<SheetKind, string> = {
  wheel: 'Degree wheel',
  ring: 'Flange ring',
  strip: 'Rim strip',
  scribe: 'Scribe chart',
  check: 'Scale check',
};

/**
 * A length in the title block, to 0.01 mm in the sheet's locale ("120.5 mm", "120,5 mm"; DEVELOPERS.md, "Numbers").
 * Degrees stay with '.', like the scale's own numerals.
 */
function mm(value: number, locale: string): string {
  return formatMm(value, locale, { maxPlaces: 2 });
}

function defaultTitle(req: SheetRequest, locale: string): string {
  if (req.kind === 'ring') return `${KIND_NAMES.ring} ${mm(req.innerDiameterMm ?? 0, locale)} / ${mm(req.outerDiameterMm ?? 0, locale)}`;
  if (req.kind === 'check') return `${KIND_NAMES.check} sheet`;
  return `${KIND_NAMES[req.kind]} ${mm(req.diameterMm ?? 0, locale)}`;
}

export function sheetTitle(req: SheetRequest, locale: string): string {
  return req.title.trim() || defaultTitle(req, locale);
}

function dimensionsLine(req: SheetRequest, locale: string, stripLengthMm?: number): string {
  switch (req.kind) {
    case 'wheel':
      return `Disc diameter ${mm(req.diameterMm ?? 0, locale)}${req.hubHoleMm > 0 ? ` · hub hole ${mm(req.hubHoleMm, locale)}` : ''}`;
    case 'ring':
      return `Ring inner diameter ${mm(req.innerDiameterMm ?? 0, locale)} (ticks read here) · outer ${mm(req.outerDiameterMm ?? 0, locale)}`;
    case 'strip':
      return `Rim diameter ${mm(req.diameterMm ?? 0, locale)} + paper ${mm(req.paperThicknessMm, locale)} → strip ${stripLengthMm === undefined ? '' : mm(stripLengthMm, locale)} · width ${mm(req.stripWidthMm, locale)}${windowWords(req, locale, stripLengthMm)}`;
    case 'scribe':
      return `Rim diameter ${mm(req.diameterMm ?? 0, locale)} · ${req.fromDeg}° to ${req.toDeg}° every ${req.stepDeg}°`;
    case 'check':
      return 'Scale check bars and ID-1 card outline only';
  }
}

/** A window strip's own length: its crank span of the whole strip's π·(D + t). */
function windowWords(req: SheetRequest, locale: string, stripLengthMm?: number): string {
  if (!req.windowCrankDeg || stripLengthMm === undefined) return '';
  const span = windowSpanDeg(req.windowCrankDeg);
  return ` · window ${Math.round(span * 100) / 100}° long = ${mm((stripLengthMm * span) / 360, locale)}`;
}

export function carrierLine(req: SheetRequest): string {
  return req.carrier === 'rotating'
    ? 'Carrier: rotating (on the flywheel, read against a fixed pointer)'
    : 'Carrier: stationary (on the flange or casing, read against the flywheel’s mark)';
}

export function rotationWord(req: SheetRequest): string {
  return req.rotation === 'cw' ? 'clockwise' : 'counter-clockwise';
}

export function titleBlockLines(
  req: SheetRequest,
  facts: { date: string; locale: string; keptLevels?: GraduationLevel[]; stripLengthMm?: number; strobeSummary?: string },
): string[] {
  // The scale-check sheet has no scale: carrier, rotation and numbering mean nothing there.
  if (req.kind === 'check') return [dimensionsLine(req, facts.locale), `Date ${facts.date} · paper ${req.paper} ${req.orientation}`, `Printer profile: ${req.printerProfileName?.trim() || 'none'} · correction ${describeCorrection(req)}`, ...(req.note ? [`Note: ${req.note}`] : [])];
  const lines = [
    dimensionsLine(req, facts.locale, facts.stripLengthMm),
    carrierLine(req),
    `Rotation: ${rotationWord(req)} as seen from the side the scale is on`,
    `Numbering: ${req.numbering === 'split' ? 'split (0 at TDC to 180 at BDC both ways, BTDC / ATDC)' : 'full (0–359 in crank order)'}`,
  ];
  if (facts.keptLevels) lines.push(`Graduations: ${facts.keptLevels.map((l) => `${l}°`).join(', ')}`);
  if (facts.strobeSummary) lines.push(facts.strobeSummary);
  // Marks, band and target share a line: the title block stays short enough for a ring and its panel on one page.
  const advance = [
    ...(req.advanceMarksDeg.length ? [`Advance marks: ${[...new Set(req.advanceMarksDeg)].sort((a, b) => a - b).map((d) => `${d}°`).join(', ')} BTDC`] : []),
    ...(req.advanceBandDeg ? [`Advance band: ${Math.min(...req.advanceBandDeg)}–${Math.max(...req.advanceBandDeg)}° BTDC (hatched)`] : []),
    ...(req.targetAdvanceDeg !== undefined ? [`Target: ${req.targetAdvanceDeg}° BTDC (the mark with the wedge)`] : []),
  ];
  if (advance.length) lines.push(advance.join(' · '));
  lines.push(`Date ${facts.date} · paper ${req.paper} ${req.orientation}`);
  lines.push(`Printer profile: ${req.printerProfileName?.trim() || 'none'} · correction ${describeCorrection(req)}`);
  if (req.note) lines.push(`Note: ${req.note}`);
  return lines;
}

/** Where BTDC lies, in words, for the sheet's "which way" note. */
export function whichWayNote(req: SheetRequest): string {
  if (req.kind === 'strip')
    return req.carrier === 'rotating'
      ? 'Which way: wrap the strip so its arrow points the way the rim moves. On the rim (fixed pointer) the BTDC marks lie ahead of TDC along the arrow, the ATDC marks behind it. The arrow carries the direction, so the same strip serves clockwise and counter-clockwise engines.'
      : 'Which way: stick the strip on the casing with its arrow pointing the way the flywheel rim moves. Read against the flywheel’s mark, the BTDC marks lie behind TDC (against the arrow), the ATDC marks ahead of it. The arrow carries the direction, so the same strip serves clockwise and counter-clockwise engines.';
  const withRotation = req.carrier === 'rotating';
  // Worded from where the one direction rule puts 45° BTDC.
  const btdcSide = wheelAngleDeg(btdcToCrankDeg(45), req) < 180 ? 'clockwise' : 'counter-clockwise';
  const atdcSide = btdcSide === 'clockwise' ? 'counter-clockwise' : 'clockwise';
  return `Which way: the flywheel turns ${rotationWord(req)} as seen from this side (arrow). ${
    withRotation ? 'On a rotating scale' : 'On a stationary scale'
  } the BTDC marks lie ${btdcSide} from TDC (${withRotation ? 'with' : 'against'} the rotation), the ATDC marks ${atdcSide}.`;
}
