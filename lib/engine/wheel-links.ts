import { ADVANCE_RANGE_DEG, MAX_PORT_EVENTS } from '../sheet/sheet-request';
import { ADD_MARK_PARAM, KEEP_PARAM, TDC_CRANK_PARAM, TDC_STOP_PARAM } from '../sheet-link-params';
import type { PortTiming } from './port-events';
import { fromTdcDeg, type TdcResult, type WheelNumbering } from './tdc-from-stops';

/**
 * Links that carry a calculator's result into the sheet maker on `/`, using the
 * sheet request's field names as query parameters. Numbers are written as plain
 * decimals (never exponent form), rounded to what a printed scale can show.
 * Every link asks to keep the sheet the user already has (lib/sheet-link.ts):
 * it adds its values to it instead of starting a fresh one.
 */

function decimal(value: number, places: number): string {
  return String(Number(value.toFixed(places)));
}

function href(params: Record<string, string>): string {
  return `/?${new URLSearchParams({ [KEEP_PARAM]: '1', ...params }).toString()}`;
}

/** Port events onto a full-numbered wheel; ports that never open are left off. */
export function portEventsWheelHref(ports: PortTiming[]): string | null {
  const events = ports
    .filter((port) => port.opensDegATDC !== null && port.closesDegATDC !== null)
    .slice(0, MAX_PORT_EVENTS)
    .map((port) => ({
      name: port.name,
      opensCrankDeg: Number(decimal(port.opensDegATDC as number, 1)),
      closesCrankDeg: Number(decimal(port.closesDegATDC as number, 1)),
    }));
  if (events.length === 0) return null;
  return href({ numbering: 'full', portEvents: JSON.stringify(events) });
}

/** An ignition advance mark; null when the angle is outside what the sheet accepts (0–60° BTDC). */
export function advanceMarkHref(btdcDeg: number): string | null {
  const rounded = Number(decimal(btdcDeg, 1));
  if (!(rounded >= ADVANCE_RANGE_DEG.min && rounded <= ADVANCE_RANGE_DEG.max)) return null;
  return href({ [ADD_MARK_PARAM]: String(rounded) });
}

/** Where true TDC reads on a wheel of the given numbering: full 0–359 in crank order, split 0–180 BTDC/ATDC. */
function readingOn(numbering: WheelNumbering, tdcCrankOrderDeg: number): string {
  if (numbering === 'full') return `${decimal(tdcCrankOrderDeg, 1)}°`;
  const signed = Number(decimal(fromTdcDeg(tdcCrankOrderDeg), 1));
  if (signed === 0) return '0°';
  return `${decimal(Math.abs(signed), 1)}° ${signed < 0 ? 'BTDC' : 'ATDC'}`;
}

/**
 * The TDC note, written for the numbering of the sheet it goes on: the calculator may have been read on a full
 * wheel while the sheet is split (359.8° on a full wheel is 0.2° BTDC on a split one). The correction is the same
 * turn in either numbering.
 */
export function tdcNoteText(result: Pick<TdcResult, 'tdcCrankOrderDeg' | 'stopAngleDeg'>, numbering: WheelNumbering): string {
  const correctionDeg = -fromTdcDeg(result.tdcCrankOrderDeg);
  const stop = `stop ${decimal(result.stopAngleDeg, 1)}° either side`;
  if (Number(decimal(correctionDeg, 1)) === 0) return `TDC checked: the wheel reads 0° at TDC (${stop})`;
  const toward = correctionDeg > 0 ? 'the ATDC side' : 'the BTDC side';
  return `True TDC reads ${readingOn(numbering, result.tdcCrankOrderDeg)} on this wheel (${stop}): move the pointer ${decimal(Math.abs(correctionDeg), 1)}° toward ${toward}`;
}

/** The TDC result as figures; the sheet maker writes the note for the numbering the sheet ends up with. */
export function tdcNoteHref(result: Pick<TdcResult, 'tdcCrankOrderDeg' | 'stopAngleDeg'>): string {
  return href({ [TDC_CRANK_PARAM]: decimal(result.tdcCrankOrderDeg, 2), [TDC_STOP_PARAM]: decimal(result.stopAngleDeg, 2) });
}

/** A scribe chart for the diameter, spanning the listed angles when they fit the chart's 0–180° range. */
export function scribeChartHref(diameterMm: number, anglesDeg: number[]): string {
  const params: Record<string, string> = { kind: 'scribe', diameterMm: decimal(diameterMm, 2) };
  const fromDeg = Math.min(...anglesDeg);
  const toDeg = Math.max(...anglesDeg);
  if (anglesDeg.length > 0 && toDeg <= 180) {
    params.fromDeg = decimal(fromDeg, 1);
    params.toDeg = decimal(toDeg, 1);
  }
  return href(params);
}
