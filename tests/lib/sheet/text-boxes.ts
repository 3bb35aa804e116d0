// Test support: estimated ink boxes of SVG text, read back with @xmldom/xmldom, and whether two
// overlap. Width = size × characters × 0.6 (a typical sans-serif average advance, common
// practice); height from 0.75 × size above the baseline to 0.2 × size below it (cap height and
// descender of common sans-serif faces, from memory). Rotation as SVG 1.1 §7.5 rotate(a x y):
// with y down, a positive angle turns clockwise on the page.
import type { Element as XmlElement } from '@xmldom/xmldom';
import { n, type Svg } from './svg-measure';

export type TextBox = { text: string; role: string; corners: Array<[number, number]> };

export function textBox(el: XmlElement): TextBox {
  const x = n(el, 'x');
  const y = n(el, 'y');
  const size = n(el, 'font-size');
  const content = el.textContent ?? '';
  const width = size * content.length * 0.6;
  const anchor = el.getAttribute('text-anchor') ?? 'start';
  const start = anchor === 'middle' ? -width / 2 : anchor === 'end' ? -width : 0;
  const match = /rotate\(([-\d.e]+)/.exec(el.getAttribute('transform') ?? '');
  const a = ((match ? Number(match[1]) : 0) * Math.PI) / 180;
  const local: Array<[number, number]> = [
    [start, -0.75 * size],
    [start + width, -0.75 * size],
    [start + width, 0.2 * size],
    [start, 0.2 * size],
  ];
  return {
    text: content,
    role: el.getAttribute('data-role') ?? '',
    corners: local.map(([u, v]) => [x + u * Math.cos(a) - v * Math.sin(a), y + u * Math.sin(a) + v * Math.cos(a)]),
  };
}

/** Separating-axis test for two convex quadrilaterals; touching within `slackMm` does not count. */
export function boxesOverlap(p: TextBox, q: TextBox, slackMm = 0.05): boolean {
  for (const box of [p, q]) {
    for (let i = 0; i < 4; i += 1) {
      const [ax, ay] = box.corners[i]!;
      const [bx, by] = box.corners[(i + 1) % 4]!;
      const length = Math.hypot(bx - ax, by - ay) || 1;
      const [nx, ny] = [-(by - ay) / length, (bx - ax) / length];
      const project = (b: TextBox) => b.corners.map(([cx, cy]) => cx * nx + cy * ny);
      const pp = project(p);
      const qq = project(q);
      if (Math.max(...pp) - slackMm <= Math.min(...qq) || Math.max(...qq) - slackMm <= Math.min(...pp)) return false;
    }
  }
  return true;
}

/** Every pair of text elements (passing `keep`) whose boxes overlap, as readable strings. */
export function overlappingTexts(svg: Svg, keep: (el: XmlElement) => boolean = () => true): string[] {
  const boxes = svg.all('text').filter(keep).map(textBox);
  const pairs: string[] = [];
  for (let i = 0; i < boxes.length; i += 1)
    for (let j = i + 1; j < boxes.length; j += 1)
      if (boxesOverlap(boxes[i]!, boxes[j]!)) pairs.push(`"${boxes[i]!.text}" (${boxes[i]!.role}) × "${boxes[j]!.text}" (${boxes[j]!.role})`);
  return pairs;
}
