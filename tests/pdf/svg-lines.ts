import { DOMParser } from '@xmldom/xmldom';

/** Every <line> of an SVG document with its end points and data-* attributes, read by @xmldom/xmldom. */
export type SvgLine = { x1: number; y1: number; x2: number; y2: number; data: Record<string, string> };

export function svgLines(svg: string): SvgLine[] {
  const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
  const lines = Array.from(doc.getElementsByTagName('line'));
  return lines
    .filter((el) => el.parentNode?.nodeName !== 'pattern') // the hatch pattern's tile is not a drawing line
    .map((el) => {
      const data: Record<string, string> = {};
      for (const attr of Array.from(el.attributes)) if (attr.name.startsWith('data-')) data[attr.name.slice(5)] = attr.value;
      const n = (name: string) => Number(el.getAttribute(name));
      return { x1: n('x1'), y1: n('y1'), x2: n('x2'), y2: n('y2'), data };
    });
}

/** Every <text> of an SVG: anchor point, text-anchor, rotation (degrees, from rotate(θ x y)) and content. */
export type SvgText = { x: number; y: number; anchor: string; rotateDeg: number; text: string };

export function svgTexts(svg: string): SvgText[] {
  const doc = new DOMParser().parseFromString(svg, 'image/svg+xml');
  return Array.from(doc.getElementsByTagName('text')).map((el) => {
    const rotate = /rotate\(\s*([-\d.e]+)/.exec(el.getAttribute('transform') ?? '');
    return {
      x: Number(el.getAttribute('x')),
      y: Number(el.getAttribute('y')),
      anchor: el.getAttribute('text-anchor') ?? 'start',
      rotateDeg: rotate ? Number(rotate[1]) : 0,
      text: el.textContent ?? '',
    };
  });
}
