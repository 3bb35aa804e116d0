import type { Shape } from './drawing';
import type { SheetRequest } from './sheet-request';
import { text } from './shapes';
import { lengthWidthMm, TEXT_MM } from './sheet-style';
import { wordLengthsOf, wrappedLineCount, wrapText, type WordLengths } from './text-wrap';

/**
 * "How to use this sheet": a few numbered steps per kind of sheet, in the trade's words
 * (print and measure, cut, fix, pointer, TDC with a positive stop, read). A wheel or ring carries
 * them inside its scale where there is room (howToInCircle); otherwise the info panel does.
 */

export const HOW_TO_HEADING = 'How to use this sheet';

const MEASURE = 'Print at 100 % and measure the check bars: 100 mm must read 100.0 mm.';
const STOP =
  'Find TDC with a positive stop in the plug hole: turn the engine by hand against the stop one way, then the other, and take the point half way between the two readings.';

function stripSteps(req: SheetRequest): string[] {
  const rotating = req.carrier === 'rotating';
  const window = req.windowCrankDeg !== undefined;
  return [
    MEASURE,
    window
      ? 'Cut along the outline (every lettered piece; lay each on the previous one’s join line).'
      : 'Cut along the outline, lettered pieces in order; overlap each on the previous one’s join line and keep the glue tail on the last.',
    rotating
      ? `Wrap it round the flywheel rim with the arrow pointing the way the rim moves${window ? '' : ', the seam at BDC and the glue tail under the start'}; tape or spray glue, no stretch, no gap.`
      : `Stick it on the casing beside the rim with the arrow pointing the way the rim moves${window ? '' : ', the seam at BDC'}; tape or spray glue.`,
    rotating ? 'Fix a pointer to the casing (stiff wire, bent to just clear the strip).' : 'Scribe a fine line on the flywheel rim as the pointer.',
    `${STOP} Slide the strip until 0 sits at the pointer there, then fix it down.`,
    'Take the stop out. Read the advance at the pointer when the spark comes (strobe or test light).',
  ];
}

/** The steps for a sheet, numbered; none for the scale-check sheet. */
export function howToSteps(req: SheetRequest): string[] {
  let steps: string[];
  switch (req.kind) {
    case 'wheel':
      steps = [
        MEASURE,
        `Cut on the outer line${req.hubHoleMm > 0 ? ' and the hub hole' : ''}.`,
        'Fix the disc to the flywheel face or crank nut, centre on the crank, this side out: tape or spray glue.',
        'Make a fixed pointer (stiff wire under a casing screw) with its tip over the scale.',
        `${STOP} Turn the disc on the crank, not the crank, until the pointer reads 0 there.`,
        'Take the stop out. Read the advance at the pointer when the spark comes.',
      ];
      break;
    case 'ring':
      steps = [
        MEASURE,
        'Cut on the outer and the inner circle.',
        'Fix the ring on the flange or casing round the flywheel, this side out: tape or spray glue.',
        'Scribe a fine line on the flywheel rim as the pointer.',
        `${STOP} Turn the ring until 0 sits at the flywheel’s line there.`,
        'Take the stop out. Read the advance at the flywheel’s line when the spark comes.',
      ];
      break;
    case 'strip':
      steps = stripSteps(req);
      break;
    case 'scribe':
      steps = [
        MEASURE,
        `${STOP} Mark TDC on the flywheel rim and on the casing.`,
        'Set dividers to the chord, or a flexible rule to the arc, of the angle you want.',
        'From the TDC mark, scribe the advance mark the way the caption says.',
        'Measure again from TDC before you time by it.',
      ];
      break;
    case 'check':
      return [];
  }
  return steps.map((step, i) => `${i + 1}. ${step}`);
}

export type HowToRows = { rows: string[]; heightMm: number };

const LINE_GAP = 1.3;

/** The steps wrapped to a width at a text size, and the height they take below the heading. */
export function howToRows(steps: readonly string[], widthMm: number, sizeMm: number = TEXT_MM.small): HowToRows {
  const rows = steps.flatMap((step) => wrapText(step, sizeMm, widthMm));
  return { rows, heightMm: rowsHeightMm(rows.length, sizeMm) };
}

function rowsHeightMm(rowCount: number, sizeMm: number): number {
  return TEXT_MM.body * 1.4 + rowCount * sizeMm * LINE_GAP;
}

/** The heading (when `heading`) and rows as text shapes, (x, y) the top-left corner. */
export function howToShapes(steps: readonly string[], widthMm: number, x: number, y: number, sizeMm: number = TEXT_MM.small, heading = true): Shape[] {
  const { rows } = howToRows(steps, widthMm, sizeMm);
  const top = heading ? TEXT_MM.body * 1.4 : 0;
  return [
    ...(heading ? [text(x, y + TEXT_MM.body, HOW_TO_HEADING, TEXT_MM.body, { weight: 'bold', data: { role: 'how-to-heading' } })] : []),
    ...rows.map((row, i) => text(x, y + top + sizeMm * 0.8 + i * sizeMm * LINE_GAP, row, sizeMm, { data: { role: 'how-to' } })),
  ];
}

const IN_CIRCLE_MM = 1.8;

function letterCount(paragraphs: WordLengths): number {
  let letters = 0;
  for (const words of paragraphs) for (const length of words) letters += length;
  return letters;
}

/**
 * The steps inside a free circle of `radiusMm` about `centreMm` (the blank middle of a wheel's
 * scale, or a ring's hole), kept `clearMm` above and below its centre (the centre cross or hub):
 * all below the centre, or the first steps above and the rest below; undefined when they do not fit.
 */
export function howToInCircle(steps: readonly string[], centreMm: [number, number], radiusMm: number, clearMm: number): Shape[] | undefined {
  if (!steps.length || radiusMm < 20) return undefined;
  const [cx, cy] = centreMm;
  const size = IN_CIRCLE_MM;
  const stepWords = steps.map(wordLengthsOf);
  const stepLetters = stepWords.map(letterCount);
  for (let share = 0.95; share >= 0.5; share -= 0.05) {
    const widthMm = 2 * radiusMm * share;
    const fits = (heightMm: number) => Math.hypot(widthMm / 2, clearMm + heightMm) <= radiusMm;
    // A line holds no more letters than fit the width, so no step takes fewer rows than this. Both halves of a split
    // must fit above and below the centre: when even these rows are more than the two together hold, skip the width.
    const lettersPerRow = Math.floor(widthMm / lengthWidthMm(1, size)) + 1; // + 1: rounding never makes it too few
    const fewestRows = stepLetters.reduce((sum, letters) => sum + Math.ceil(letters / lettersPerRow), 0);
    const roomEachSideMm = Math.sqrt(Math.max(0, radiusMm ** 2 - (widthMm / 2) ** 2)) - clearMm;
    if (rowsHeightMm(fewestRows, size) > 2 * roomEachSideMm) continue;
    // Each step's rows counted once per width; the splits below only add them up (as howToRows would).
    const stepRows = stepWords.map((words) => wrappedLineCount(words, size, widthMm));
    const rowsOf = (from: number, to: number) => stepRows.slice(from, to).reduce((sum, n) => sum + n, 0);
    const all = rowsHeightMm(rowsOf(0, steps.length), size);
    if (fits(all)) return howToShapes(steps, widthMm, cx - widthMm / 2, cy + clearMm, size);
    for (let split = 1; split < steps.length; split += 1) {
      const upper = rowsHeightMm(rowsOf(0, split), size);
      const lower = rowsHeightMm(rowsOf(split, steps.length), size) - TEXT_MM.body * 1.4;
      if (fits(upper) && fits(lower))
        return [...howToShapes(steps.slice(0, split), widthMm, cx - widthMm / 2, cy - clearMm - upper, size), ...howToShapes(steps.slice(split), widthMm, cx - widthMm / 2, cy + clearMm, size, false)];
    }
  }
  return undefined;
}
