import { ADVANCE_RANGE_DEG, MAX_PORT_EVENTS } from '../sheet/sheet-request';
import type { PortTiming } from './port-events';
import type { TdcResult } from './tdc-from-stops';

/**
 * Links that carry a calculator's result into the sheet maker on `/`, using the
 * sheet request's field names as query parameters. Numbers are written as plain
 * decimals (never exponent form), rounded to what a printed scale can show.
 */

function decimal(value: number, places: number): string {
  return String(Number(value.toFixed(places)));
}

function href(params: Record<string, string>): string {
  return `/?${new URLSearchParams(params).toString()}`;
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
  return href({ kind: 'wheel', numbering: 'full', portEvents: JSON.stringify(events) });
}

/** An ignition advance mark; null when the angle is outside what the sheet accepts (0–60° BTDC). */
export function advanceMarkHref(btdcDeg: number): string | null {
  const rounded = Number(decimal(btdcDeg, 1));
  if (!(rounded >= ADVANCE_RANGE_DEG.min && rounded <= ADVANCE_RANGE_DEG.max)) return null;
  return href({ advanceMarksDeg: String(rounded) });
}

export function tdcNoteText(result: TdcResult): string {
  const at =
    result.tdcReadingSide === null
      ? `${decimal(result.tdcReadingDeg, 1)}°`
      : result.tdcReadingSide === 'TDC'
        ? '0°'
        : `${decimal(result.tdcReadingDeg, 1)}° ${result.tdcReadingSide}`;
  const stop = `stop ${decimal(result.stopAngleDeg, 1)}° either side`;
  if (result.correctionDeg === 0) return `TDC checked: the wheel reads 0° at TDC (${stop})`;
  const toward = result.correctionDeg > 0 ? 'the ATDC side' : 'the BTDC side';
  return `True TDC reads ${at} on this wheel (${stop}): move the pointer ${decimal(Math.abs(result.correctionDeg), 1)}° toward ${toward}`;
}

export function tdcNoteHref(result: TdcResult): string {
  return href({ note: tdcNoteText(result).slice(0, 200) });
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
