import type { Drawing } from './drawing';

/**
 * Whether the printed sheet is in pieces the user must join: a scale tiled across pages (registration crosses)
 * or a strip cut into lettered segments. A wheel followed by its info page is two pages but nothing to join.
 */
export function needsJoining(drawing: Pick<Drawing, 'shapes'>): boolean {
  const segments = new Set<string>();
  for (const shape of drawing.shapes) {
    if (shape.data?.role === 'registration' || shape.data?.role === 'join') return true;
    if (shape.data?.segment) segments.add(shape.data.segment);
  }
  return segments.size > 1;
}
