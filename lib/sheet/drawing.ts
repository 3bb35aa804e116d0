/**
 * The drawing model: what every layout produces and what both renderers (SVG in
 * lib/sheet/render-svg.ts, PDF in pdf/) consume. All coordinates are millimetres
 * on the drawing, x to the right, y downwards, origin at the top-left corner.
 * Nothing here knows about SVG, PDF or React.
 */

export type GraduationLevel = 10 | 5 | 1 | 0.5;

/** Machine-readable facts about a shape, written out as data-* attributes in SVG. */
export type ShapeData = {
  crankDeg?: number; // data-crank-deg, 0–360
  level?: GraduationLevel; // data-level
  advanceDeg?: number; // data-advance-deg (BTDC)
  checkMm?: number; // data-check-mm (scale-check bars and card outline)
  axis?: 'x' | 'y'; // data-axis for scale-check bars
  role?: string; // data-role: 'tdc-pointer', 'cut-line', 'port', 'join', 'registration', ...
  segment?: string; // data-segment: the letter of a tiled strip segment ('A', 'B', …)
};

export type Fill = 'none' | 'black' | 'white' | 'grey15' | 'hatch';

type ShapeBase = { strokeMm: number; data?: ShapeData };

export type LineShape = ShapeBase & { type: 'line'; x1Mm: number; y1Mm: number; x2Mm: number; y2Mm: number; dashMm?: number };

/** A polyline or polygon; arcs (advance bands, arrows) are sampled into points. */
export type PathShape = ShapeBase & { type: 'path'; pointsMm: Array<[number, number]>; closed: boolean; fill: Fill };

/** A circle when rxMm === ryMm; an ellipse after an uneven printer correction. */
export type EllipseShape = ShapeBase & { type: 'ellipse'; cxMm: number; cyMm: number; rxMm: number; ryMm: number; fill: Fill; dashMm?: number };

export type RectShape = ShapeBase & { type: 'rect'; xMm: number; yMm: number; widthMm: number; heightMm: number; fill: Fill };

/** Text anchored at (xMm, yMm) on its alphabetic baseline, rotated about that point (degrees, clockwise). */
export type TextShape = {
  type: 'text';
  xMm: number;
  yMm: number;
  text: string;
  sizeMm: number;
  anchor: 'start' | 'middle' | 'end';
  rotateDeg: number;
  weight: 'normal' | 'bold';
  font: 'ui' | 'figures';
  data?: ShapeData;
};

export type Shape = LineShape | PathShape | EllipseShape | RectShape | TextShape;

export type Size = { widthMm: number; heightMm: number };

/**
 * One printed page: the part of the drawing it shows (`viewport`, drawing mm),
 * where that part lands on the page (`originMm`, page mm), and shapes of the page
 * itself in page mm (segment letters, join marks, registration crosses, page number).
 */
export type PageLayout = {
  sizeMm: Size;
  viewportMm: { xMm: number; yMm: number; widthMm: number; heightMm: number };
  originMm: [number, number];
  pageShapes: Shape[];
};

export type Drawing = {
  sizeMm: Size; // the whole untiled drawing (the SVG's width and height)
  centreMm?: [number, number]; // wheel or ring centre (SVG data-centre-mm)
  shapes: Shape[];
  pages: PageLayout[]; // one when it fits, several when tiled
  warnings: string[]; // dropped graduation levels, tiling, clipped windows…
  title: string; // for file names and document metadata
};
