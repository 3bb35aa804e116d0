import { normalizeDeg } from '@/lib/angle';
import { btdcDegFromBtdcMm, btdcMmFromBtdcDeg } from '@/lib/engine/btdc-timing';
import { offsetCrankGeometryProblem } from '@/lib/engine/offset-slider-crank';
import { portEvents, type PortStatus } from '@/lib/engine/port-events';
import { tdcFromStops, type TdcResult } from '@/lib/engine/tdc-from-stops';
import type { BuildFields } from './build-fields';

/**
 * What a build record works out from its measurements, with the calculators' own
 * functions (TDC from stops, the slider-crank timing conversion, port events), so a
 * record and a calculator given the same figures agree to the last digit.
 */

/** Port duration within this many degrees of the template's target counts as on target (common practice). */
export const DEFAULT_TOLERANCE_DEG = 2;

export type BuildPortResult = {
  name: string;
  heightMm: number;
  status: PortStatus | 'not-computed';
  opensDegATDC: number | null;
  closesDegATDC: number | null;
  durationDeg: number | null;
  targetDurationDeg?: number;
  deviationDeg?: number;
  withinTolerance?: boolean;
  note: string;
};

export type BuildResults = {
  tdc: Pick<TdcResult, 'tdcReadingDeg' | 'tdcReadingSide' | 'correctionDeg' | 'sweepDeg' | 'stopAngleDeg'> | null;
  timingSetDegBTDC: number | null;
  timingSetMmBTDC: number | null;
  timingEnteredAs: 'deg' | 'mm' | null;
  timingNote: string;
  ports: BuildPortResult[];
  blowdownDeg: number | null;
  blowdownNote: string;
  /** The ± duration tolerance the deviations were judged with. */
  toleranceDeg: number;
};

type Geometry = { strokeMm: number; rodMm: number; pinOffsetMm: number };

function geometryOf(b: BuildFields): Geometry | null {
  if (b.strokeMm === null || b.rodMm === null) return null;
  const geometry = { strokeMm: b.strokeMm, rodMm: b.rodMm, pinOffsetMm: b.pinOffsetMm };
  return offsetCrankGeometryProblem(geometry) ? null : geometry;
}

function tdcOf(b: BuildFields): BuildResults['tdc'] {
  if (!b.stops) return null;
  try {
    const { tdcReadingDeg, tdcReadingSide, correctionDeg, sweepDeg, stopAngleDeg } = tdcFromStops(b.stops);
    return { tdcReadingDeg, tdcReadingSide, correctionDeg, sweepDeg, stopAngleDeg };
  } catch {
    return null; // readings 180° apart: the schema refuses them before they get here
  }
}

function timingOf(b: BuildFields, geometry: Geometry | null): Pick<BuildResults, 'timingSetDegBTDC' | 'timingSetMmBTDC' | 'timingEnteredAs' | 'timingNote'> {
  if (b.timingSetDegBTDC !== null) {
    const mm = geometry ? btdcMmFromBtdcDeg({ ...geometry, btdcDeg: b.timingSetDegBTDC }) : null;
    return { timingSetDegBTDC: b.timingSetDegBTDC, timingSetMmBTDC: mm, timingEnteredAs: 'deg', timingNote: mm === null ? 'The piston travel needs the stroke and the con-rod length' : '' };
  }
  if (b.timingSetMmBTDC !== null) {
    const deg = geometry ? btdcDegFromBtdcMm({ ...geometry, btdcMm: b.timingSetMmBTDC }) : null;
    return { timingSetDegBTDC: deg, timingSetMmBTDC: b.timingSetMmBTDC, timingEnteredAs: 'mm', timingNote: deg === null ? 'The crank angle needs the stroke and the con-rod length' : '' };
  }
  return { timingSetDegBTDC: null, timingSetMmBTDC: null, timingEnteredAs: null, timingNote: '' };
}

const sameName = (a: string, b: string) => a.trim().toLowerCase() === b.trim().toLowerCase();

function compareWithTarget(port: BuildPortResult, b: BuildFields, toleranceDeg: number): BuildPortResult {
  const target = b.portTargets.find((t) => sameName(t.name, port.name));
  if (!target || port.durationDeg === null) return port;
  // A target may wrap past TDC (an inlet opening at 285° and closing at 75° is open 150°).
  const targetDurationDeg = normalizeDeg(target.closesCrankDeg - target.opensCrankDeg);
  const deviationDeg = port.durationDeg - targetDurationDeg;
  return { ...port, targetDurationDeg, deviationDeg, withinTolerance: Math.abs(deviationDeg) <= toleranceDeg };
}

function portsOf(b: BuildFields, geometry: Geometry | null, toleranceDeg: number): Pick<BuildResults, 'ports' | 'blowdownDeg' | 'blowdownNote'> {
  if (b.ports.length === 0) return { ports: [], blowdownDeg: null, blowdownNote: '' };
  if (!geometry || b.deckMm === null) {
    const note = 'Port angles need the stroke, the con-rod length and the deck height';
    return {
      ports: b.ports.map((p) => ({ name: p.name, heightMm: p.heightMm, status: 'not-computed', opensDegATDC: null, closesDegATDC: null, durationDeg: null, note })),
      blowdownDeg: null,
      blowdownNote: note,
    };
  }
  const events = portEvents({ ...geometry, deckMm: b.deckMm, ports: b.ports });
  const ports = events.ports.map((t, i) =>
    compareWithTarget(
      { name: t.name, heightMm: b.ports[i]!.heightMm, status: t.status, opensDegATDC: t.opensDegATDC, closesDegATDC: t.closesDegATDC, durationDeg: t.durationDeg, note: t.note },
      b,
      toleranceDeg,
    ),
  );
  return { ports, blowdownDeg: events.blowdownDeg, blowdownNote: events.blowdownNote };
}

export function buildResults(b: BuildFields, toleranceDeg = DEFAULT_TOLERANCE_DEG): BuildResults {
  const geometry = geometryOf(b);
  return { tdc: tdcOf(b), ...timingOf(b, geometry), ...portsOf(b, geometry, toleranceDeg), toleranceDeg };
}
