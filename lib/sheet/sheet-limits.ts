/**
 * The limits of a sheet request, apart from its field table: plain numbers that the browser's form can read
 * without loading the schema library the table is built with (the home page's first visit stays light).
 * Lengths in mm, angles in degrees.
 */

export const DIAMETER_RANGE_MM = { min: 20, max: 600 } as const;
export const STRIP_WIDTH_RANGE_MM = { min: 6, max: 40 } as const;
export const ADVANCE_RANGE_DEG = { min: 0, max: 60 } as const;
export const PRINTER_SCALE_RANGE = { min: 0.9, max: 1.1 } as const;
export const MAX_ADVANCE_MARKS = 72;
export const MAX_PORT_EVENTS = 12;
export const MAX_SCRIBE_ROWS = 400;
