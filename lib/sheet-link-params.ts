/**
 * Query parameters of links into the sheet maker that are instructions, not sheet fields (lib/sheet-link.ts).
 * `keep=1`: add the link's values to the sheet the user already has. `addAdvanceMarkDeg`: one more advance mark.
 * `tdcCrankDeg` and `tdcStopDeg`: a TDC check, turned into a note for the numbering the sheet will use.
 */
export const KEEP_PARAM = 'keep';
export const ADD_MARK_PARAM = 'addAdvanceMarkDeg';
export const TDC_CRANK_PARAM = 'tdcCrankDeg';
export const TDC_STOP_PARAM = 'tdcStopDeg';
export const UNIT_PARAM = 'unit';

export const INSTRUCTION_PARAMS = [KEEP_PARAM, ADD_MARK_PARAM, TDC_CRANK_PARAM, TDC_STOP_PARAM] as const;

/** The browser's last sheet: the sheet maker's query string, written by the form as it changes. */
export const SHEET_COOKIE = 'rimscale-sheet';
