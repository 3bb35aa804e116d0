import { shapeBox } from './bounds';
import type { Drawing, Fill, Shape, ShapeData } from './drawing';

/**
 * The drawing as a standalone SVG at true size: width/height in mm and a viewBox in mm,
 * so one user unit is one millimetre in any viewer, editor or cutter. Untiled.
 */

export const SHEET_FONT_FAMILIES = {
  ui: "'Rimscale Sheet', 'DejaVu Sans', Arial, sans-serif",
  figures: "'Rimscale Figures', 'DejaVu Sans Mono', 'Courier New', monospace",
} as const;
export const HATCH_PATTERN_ID = 'rimscale-hatch';
export const GREY15 = '#d9d9d9'; // 15 % black on white

function decimalsOf(tenThousandths: number): string {
  if (tenThousandths % 1000 === 0) return '.' + tenThousandths / 1000;
  if (tenThousandths % 100 === 0) return (tenThousandths < 1000 ? '.0' : '.') + tenThousandths / 100;
  if (tenThousandths % 10 === 0) return (tenThousandths < 100 ? '.00' : tenThousandths < 1000 ? '.0' : '.') + tenThousandths / 10;
  return (tenThousandths < 10 ? '.000' : tenThousandths < 100 ? '.00' : tenThousandths < 1000 ? '.0' : '.') + tenThousandths;
}

// Whole millimetres below this (every sheet's coordinates) are written from tables, with their sign.
const WHOLES = 1024;

type NumberTables = { decimals: string[]; wholes: string[]; negativeWholes: string[] };
let tables: NumberTables | undefined;

/** '', '.0001', … '.9999' (trailing zeros dropped), '0'…'1023' and '-0'…'-1023': made on the first SVG, then shared. */
function numberTables(): NumberTables {
  tables ??= {
    decimals: Array.from({ length: 10000 }, (_, i) => (i === 0 ? '' : decimalsOf(i))),
    wholes: Array.from({ length: WHOLES }, (_, i) => String(i)),
    negativeWholes: Array.from({ length: WHOLES }, (_, i) => `-${i}`),
  };
  return tables;
}

/**
 * Fixed small precision (4 decimals ≈ 0.1 µm), no exponent, never NaN. Written from the whole
 * count of ten-thousandths, which gives the digits String(rounded) gives without the
 * float-to-shortest conversion (a third of the SVG's time on a wheel): below 1024 mm, two
 * table reads and one join.
 */
export function num(value: number): string {
  const scaled = Math.round(value * 1e4);
  const magnitude = scaled < 0 ? -scaled : scaled;
  if (!(magnitude < WHOLES * 1e4)) return largeOrBadNum(value, scaled, magnitude); // NaN fails every comparison
  if (magnitude === 0) return '0';
  const { decimals, wholes, negativeWholes } = numberTables();
  const whole = (magnitude / 1e4) | 0;
  return (scaled < 0 ? negativeWholes : wholes)[whole]! + decimals[magnitude - whole * 1e4]!;
}

function largeOrBadNum(value: number, scaled: number, magnitude: number): string {
  if (!Number.isFinite(value)) throw new Error(`SVG renderer was given a non-finite number (${value})`);
  // Past 2^53 the count is no longer exact: the general conversion then.
  if (magnitude >= 2 ** 53) return String(scaled / 1e4);
  const whole = Math.floor(magnitude / 1e4);
  return (scaled < 0 ? '-' : '') + whole + numberTables().decimals[magnitude - whole * 1e4]!;
}

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' };

// One test for anything escapeXml would change: most labels and roles need nothing.
const NEEDS_ESCAPE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF&<>"']/;

export function escapeXml(content: string): string {
  if (!NEEDS_ESCAPE.test(content)) return content;
  // Drop characters XML 1.0 forbids, then escape markup.
  return content.replace(/[\u0000-\u0008\u000B\u000C\u000E-\u001F\uFFFE\uFFFF]/g, '').replace(/[&<>"']/g, (c) => ESCAPES[c]!);
}

function dataAttributes(data: ShapeData | undefined): string {
  if (!data) return '';
  let out = '';
  if (data.crankDeg !== undefined) out += ` data-crank-deg="${num(data.crankDeg)}"`;
  if (data.level !== undefined) out += ` data-level="${data.level}"`;
  if (data.advanceDeg !== undefined) out += ` data-advance-deg="${num(data.advanceDeg)}"`;
  if (data.checkMm !== undefined) out += ` data-check-mm="${num(data.checkMm)}"`;
  if (data.axis !== undefined) out += ` data-axis="${data.axis}"`;
  if (data.role !== undefined) out += ` data-role="${escapeXml(data.role)}"`;
  if (data.segment !== undefined) out += ` data-segment="${escapeXml(data.segment)}"`;
  return out;
}

function fillValue(fill: Fill): string {
  switch (fill) {
    case 'none':
      return 'none';
    case 'black':
      return '#000';
    case 'white':
      return '#fff';
    case 'grey15':
      return GREY15;
    case 'hatch':
      return `url(#${HATCH_PATTERN_ID})`;
  }
}

// A sheet uses a handful of stroke weights: each one's attribute text is made once (a few kept).
const strokeAttributes = new Map<number, string>();
const MAX_STROKE_ATTRIBUTES = 32;

function stroke(strokeMm: number, dashMm?: number): string {
  if (strokeMm <= 0) return ' stroke="none"';
  let weight = strokeAttributes.get(strokeMm);
  if (weight === undefined) {
    weight = ` stroke="#000" stroke-width="${num(strokeMm)}"`;
    if (strokeAttributes.size < MAX_STROKE_ATTRIBUTES) strokeAttributes.set(strokeMm, weight);
  }
  return dashMm ? `${weight} stroke-dasharray="${num(dashMm)} ${num(dashMm)}"` : weight;
}

export function shapeToSvg(shape: Shape): string {
  switch (shape.type) {
    case 'line':
      return `<line x1="${num(shape.x1Mm)}" y1="${num(shape.y1Mm)}" x2="${num(shape.x2Mm)}" y2="${num(shape.y2Mm)}"${stroke(shape.strokeMm, shape.dashMm)}${dataAttributes(shape.data)}/>`;
    case 'path': {
      const d = shape.pointsMm.map(([x, y], i) => `${i === 0 ? 'M' : 'L'}${num(x)} ${num(y)}`).join('') + (shape.closed ? 'Z' : '');
      return `<path d="${d}" fill="${fillValue(shape.fill)}"${stroke(shape.strokeMm)} stroke-linejoin="round"${dataAttributes(shape.data)}/>`;
    }
    case 'ellipse':
      return shape.rxMm === shape.ryMm
        ? `<circle cx="${num(shape.cxMm)}" cy="${num(shape.cyMm)}" r="${num(shape.rxMm)}" fill="${fillValue(shape.fill)}"${stroke(shape.strokeMm, shape.dashMm)}${dataAttributes(shape.data)}/>`
        : `<ellipse cx="${num(shape.cxMm)}" cy="${num(shape.cyMm)}" rx="${num(shape.rxMm)}" ry="${num(shape.ryMm)}" fill="${fillValue(shape.fill)}"${stroke(shape.strokeMm, shape.dashMm)}${dataAttributes(shape.data)}/>`;
    case 'rect':
      return `<rect x="${num(shape.xMm)}" y="${num(shape.yMm)}" width="${num(shape.widthMm)}" height="${num(shape.heightMm)}" fill="${fillValue(shape.fill)}"${stroke(shape.strokeMm)}${dataAttributes(shape.data)}/>`;
    case 'text': {
      const x = num(shape.xMm);
      const y = num(shape.yMm);
      const rotate = shape.rotateDeg ? ` transform="rotate(${num(shape.rotateDeg)} ${x} ${y})"` : '';
      const weight = shape.weight === 'bold' ? ' font-weight="bold"' : '';
      return `<text x="${x}" y="${y}" fill="#000" font-size="${num(shape.sizeMm)}" font-family="${SHEET_FONT_FAMILIES[shape.font]}" text-anchor="${shape.anchor}"${weight}${rotate}${dataAttributes(shape.data)}>${escapeXml(shape.text)}</text>`;
    }
  }
}

/**
 * The shapes as SVG elements, one per line. Appended to one string (a rope the runtime flattens
 * once, when the SVG is sent) rather than joined from an array of them: a fifth quicker on a wheel.
 */
export function shapesToSvg(shapes: readonly Shape[]): string {
  let out = '';
  for (let i = 0; i < shapes.length; i += 1) out += (i === 0 ? '' : '\n') + shapeToSvg(shapes[i]!);
  return out;
}

function defs(): string {
  return `<defs><pattern id="${HATCH_PATTERN_ID}" patternUnits="userSpaceOnUse" width="1.2" height="1.2" patternTransform="rotate(45)"><line x1="0" y1="0" x2="0" y2="1.2" stroke="#000" stroke-width="0.15"/></pattern></defs>`;
}

export function renderSvg(drawing: Drawing): string {
  const { widthMm, heightMm } = drawing.sizeMm;
  const w = num(widthMm);
  const h = num(heightMm);
  const centre = drawing.centreMm ? ` data-centre-mm="${num(drawing.centreMm[0])} ${num(drawing.centreMm[1])}"` : '';
  const parts: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${w}mm" height="${h}mm" viewBox="0 0 ${w} ${h}"${centre} data-pages="${drawing.pages.length}">`,
    `<title>${escapeXml(drawing.title)}</title>`,
    defs(),
    `<rect x="0" y="0" width="${w}" height="${h}" fill="#fff" data-role="paper"/>`,
    `<g fill="none" stroke-linecap="butt">`,
  ];
  if (drawing.shapes.length) parts.push(shapesToSvg(drawing.shapes));
  parts.push('</g></svg>');
  return parts.join('\n');
}

/**
 * One printed page of the drawing as its own true-size SVG (width and height the paper's, in mm):
 * the part of the drawing the page shows, clipped to its viewport and moved to where it lands on
 * the page, then the page's own shapes (tile label, band). A multi-page sheet is one of these per page.
 */
export function renderSvgPage(drawing: Drawing, pageIndex: number): string {
  const page = drawing.pages[pageIndex];
  if (!page) throw new Error(`The sheet has no page ${pageIndex + 1}`);
  const { viewportMm: v, originMm: [ox, oy], sizeMm } = page;
  const w = num(sizeMm.widthMm);
  const h = num(sizeMm.heightMm);
  const parts: string[] = [
    `<svg xmlns="http://www.w3.org/2000/svg" width="${w}mm" height="${h}mm" viewBox="0 0 ${w} ${h}" data-page="${pageIndex + 1}" data-pages="${drawing.pages.length}">`,
    `<title>${escapeXml(`${drawing.title} — page ${pageIndex + 1} of ${drawing.pages.length}`)}</title>`,
    defs(),
    `<clipPath id="rimscale-page-view"><rect x="${num(ox)}" y="${num(oy)}" width="${num(v.widthMm)}" height="${num(v.heightMm)}"/></clipPath>`,
    `<rect x="0" y="0" width="${w}" height="${h}" fill="#fff" data-role="paper"/>`,
    `<g clip-path="url(#rimscale-page-view)"><g transform="translate(${num(ox - v.xMm)} ${num(oy - v.yMm)})" fill="none" stroke-linecap="butt">`,
  ];
  for (const shape of drawing.shapes) {
    const box = shapeBox(shape);
    if (box.maxX < v.xMm || box.minX > v.xMm + v.widthMm || box.maxY < v.yMm || box.minY > v.yMm + v.heightMm) continue;
    parts.push(shapeToSvg(shape));
  }
  parts.push('</g></g>', '<g fill="none" stroke-linecap="butt">');
  for (const shape of page.pageShapes) parts.push(shapeToSvg(shape));
  parts.push('</g></svg>');
  return parts.join('\n');
}
