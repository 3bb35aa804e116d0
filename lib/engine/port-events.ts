import { crankDegFromDropMm, type CrankGeometry } from './slider-crank';
import { portKindFromName, type PortKind } from './port-kind';

/**
 * Port timing of piston-controlled ports, every port taken as uncovered by the
 * piston CROWN (exhaust, transfers, boost; an inlet listed here is treated the
 * same way, although a piston-port inlet is really opened by the skirt near TDC).
 * The crown reaches a port's top edge when the piston has dropped
 * (edge height below the cylinder top) − (deck height), deck = crown below the
 * cylinder top at TDC, negative when the crown stands proud.
 */

export type PortInput = { name: string; heightMm: number; kind?: PortKind };

export type PortStatus = 'opens' | 'open-at-tdc' | 'never-opens';

export type PortTiming = {
  name: string;
  kind: PortKind;
  status: PortStatus;
  /** Crank angle after TDC at which the crown uncovers the edge; null when it never opens. */
  opensDegATDC: number | null;
  /** 360 − opening: the piston covers the edge again the same angle before TDC (symmetric slider-crank). */
  closesDegATDC: number | null;
  /** 360 − 2 × opening ATDC (common practice); 0 when the port never opens. */
  durationDeg: number;
  /** Opening expressed before BDC, 180 − opening; null when it never opens. */
  opensDegBBDC: number | null;
  /** Piston drop at which the port starts to open, mm. */
  openingDropMm: number;
  note: string;
};

export type PortEventsResult = { ports: PortTiming[]; blowdownDeg: number | null; blowdownNote: string };

export function portTiming({ strokeMm, rodMm, deckMm, port }: CrankGeometry & { deckMm: number; port: PortInput }): PortTiming {
  const kind = port.kind ?? portKindFromName(port.name);
  const openingDropMm = port.heightMm - deckMm;
  const base = { name: port.name, kind, openingDropMm };
  if (openingDropMm <= 0)
    return {
      ...base,
      status: 'open-at-tdc',
      opensDegATDC: 0,
      closesDegATDC: 360,
      durationDeg: 360,
      opensDegBBDC: 180,
      note: 'Open at TDC: the port edge is level with or above the piston crown at TDC, so the crown never covers it',
    };
  if (openingDropMm >= strokeMm)
    return {
      ...base,
      status: 'never-opens',
      opensDegATDC: null,
      closesDegATDC: null,
      durationDeg: 0,
      opensDegBBDC: null,
      note: `Never opens: the port edge lies ${formatMm(openingDropMm)} below the crown at TDC, at or beyond the ${formatMm(strokeMm)} stroke`,
    };
  const opensDegATDC = crankDegFromDropMm({ strokeMm, rodMm, dropMm: openingDropMm });
  return {
    ...base,
    status: 'opens',
    opensDegATDC,
    closesDegATDC: 360 - opensDegATDC,
    durationDeg: 360 - 2 * opensDegATDC,
    opensDegBBDC: 180 - opensDegATDC,
    note: `Opens ${formatMm(openingDropMm)} below TDC`,
  };
}

export function portEvents({ strokeMm, rodMm, deckMm, ports }: CrankGeometry & { deckMm: number; ports: PortInput[] }): PortEventsResult {
  const timings = ports.map((port) => portTiming({ strokeMm, rodMm, deckMm, port }));
  return { ports: timings, ...blowdown(timings) };
}

/** Blowdown: from the first exhaust opening to the first transfer opening, in crank degrees. */
export function blowdown(timings: PortTiming[]): { blowdownDeg: number | null; blowdownNote: string } {
  const exhaustOpens = earliestOpening(timings, 'exhaust');
  const transferOpens = earliestOpening(timings, 'transfer');
  if (exhaustOpens === null || transferOpens === null)
    return { blowdownDeg: null, blowdownNote: 'Blowdown needs at least one exhaust and one transfer port that open' };
  const blowdownDeg = transferOpens - exhaustOpens;
  const blowdownNote =
    blowdownDeg > 0
      ? 'Exhaust opens first, as it should'
      : 'The transfers open before (or with) the exhaust: burnt gas would blow back into the crankcase';
  return { blowdownDeg, blowdownNote };
}

function earliestOpening(timings: PortTiming[], kind: PortKind): number | null {
  const openings = timings.filter((t) => t.kind === kind && t.opensDegATDC !== null).map((t) => t.opensDegATDC as number);
  return openings.length ? Math.min(...openings) : null;
}

function formatMm(mm: number): string {
  return `${Number(mm.toFixed(3))} mm`;
}
