import { crankAnglesFromDropMm, deadCentres, type OffsetCrankGeometry } from './offset-slider-crank';
import { portKindFromName, type PortKind } from './port-kind';

/**
 * Port timing of piston-controlled ports, every port taken as uncovered by the
 * piston CROWN (exhaust, transfers, boost; an inlet listed here is treated the
 * same way, although a piston-port inlet is really opened by the skirt near TDC).
 * The crown reaches a port's top edge when the piston has dropped
 * (edge height below the cylinder top) − (deck height), deck = crown below the
 * cylinder top at TDC, negative when the crown stands proud.
 * With a wrist-pin offset the crown passes the edge at different angles going down and coming
 * up (offset-slider-crank.ts), so closing is taken from the up-stroke and duration = closing − opening;
 * with a centred pin that is the symmetric 360 − 2 × opening.
 */

export type PortInput = { name: string; heightMm: number; kind?: PortKind };

export type PortStatus = 'opens' | 'open-at-tdc' | 'never-opens';

export type PortTiming = {
  name: string;
  kind: PortKind;
  status: PortStatus;
  /** Crank angle after TDC at which the crown uncovers the edge; null when it never opens. */
  opensDegATDC: number | null;
  /** Where the crown covers the edge again on the up-stroke, in crank order (360 − opening with a centred pin). */
  closesDegATDC: number | null;
  /** Closing − opening; 360 − 2 × opening ATDC with a centred pin (common practice); 0 when the port never opens. */
  durationDeg: number;
  /** Opening expressed before BDC (180 − opening with a centred pin); null when it never opens. */
  opensDegBBDC: number | null;
  /** Piston drop at which the port starts to open, mm. */
  openingDropMm: number;
  note: string;
};

export type PortEventsResult = { ports: PortTiming[]; blowdownDeg: number | null; blowdownNote: string };

export function portTiming({ strokeMm, rodMm, pinOffsetMm = 0, deckMm, port }: OffsetCrankGeometry & { deckMm: number; port: PortInput }): PortTiming {
  const kind = port.kind ?? portKindFromName(port.name);
  const openingDropMm = port.heightMm - deckMm;
  const base = { name: port.name, kind, openingDropMm };
  const { trueStrokeMm, bdcCrankDeg } = deadCentres({ strokeMm, rodMm, pinOffsetMm });
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
  if (openingDropMm >= trueStrokeMm)
    return {
      ...base,
      status: 'never-opens',
      opensDegATDC: null,
      closesDegATDC: null,
      durationDeg: 0,
      opensDegBBDC: null,
      note: `Never opens: the port edge lies ${formatMm(openingDropMm)} below the crown at TDC, at or beyond the ${formatMm(trueStrokeMm)} stroke`,
    };
  const { crankDegATDC: opensDegATDC, crankDegBTDC } = crankAnglesFromDropMm({ strokeMm, rodMm, pinOffsetMm, dropMm: openingDropMm });
  const closesDegATDC = 360 - crankDegBTDC;
  return {
    ...base,
    status: 'opens',
    opensDegATDC,
    closesDegATDC,
    // Written as the centred-pin formula when there is no offset, so those results stay exactly as they were.
    durationDeg: pinOffsetMm === 0 ? 360 - 2 * opensDegATDC : closesDegATDC - opensDegATDC,
    opensDegBBDC: bdcCrankDeg - opensDegATDC,
    note: `Opens ${formatMm(openingDropMm)} below TDC`,
  };
}

export function portEvents({ strokeMm, rodMm, pinOffsetMm = 0, deckMm, ports }: OffsetCrankGeometry & { deckMm: number; ports: PortInput[] }): PortEventsResult {
  const timings = ports.map((port) => portTiming({ strokeMm, rodMm, pinOffsetMm, deckMm, port }));
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
