// Test support: reads a generated SVG back with @xmldom/xmldom (an independent, general-purpose
// XML parser from the npm registry) and turns its attributes into numbers to measure.
import { DOMParser, type Element as XmlElement } from '@xmldom/xmldom';
import { sheetRequestSchema, type SheetRequestInput } from '@/lib/sheet/sheet-request';

export type Svg = { root: XmlElement; all: (tag: string) => XmlElement[] };

export function parseSvg(svg: string): Svg {
  const errors: string[] = [];
  const doc = new DOMParser({ onError: (level, message) => void (level !== 'warning' && errors.push(message)) }).parseFromString(svg, 'image/svg+xml');
  if (errors.length) throw new Error(`SVG does not parse: ${errors.join('; ')}`);
  const root = doc.documentElement as unknown as XmlElement;
  return { root, all: (tag) => Array.from(doc.getElementsByTagName(tag)) as unknown as XmlElement[] };
}

export function n(el: XmlElement, name: string): number {
  const raw = el.getAttribute(name);
  if (raw === null) throw new Error(`missing attribute ${name}`);
  return Number(raw);
}

export type Line = { x1: number; y1: number; x2: number; y2: number; el: XmlElement };

export function lines(svg: Svg, filter: (el: XmlElement) => boolean = () => true): Line[] {
  return svg
    .all('line')
    .filter(filter)
    .map((el) => ({ x1: n(el, 'x1'), y1: n(el, 'y1'), x2: n(el, 'x2'), y2: n(el, 'y2'), el }));
}

export const isTick = (el: XmlElement) => el.hasAttribute('data-level');

export function centreOf(svg: Svg): [number, number] {
  const [x, y] = (svg.root.getAttribute('data-centre-mm') ?? '').split(' ').map(Number);
  return [x!, y!];
}

/** Clockwise angle as seen on the page (y down) from straight up, degrees in [0, 360). */
export function clockwiseDeg(centre: [number, number], x: number, y: number): number {
  const deg = (Math.atan2(x - centre[0], -(y - centre[1])) * 180) / Math.PI;
  return ((deg % 360) + 360) % 360;
}

export function req(input: SheetRequestInput) {
  return sheetRequestSchema.parse(input);
}

export const FIXED_DATE = new Date('2026-12-01T12:00:00Z');
