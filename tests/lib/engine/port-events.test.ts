import { describe, expect, it } from 'vitest';
import { portEvents, portTiming } from '@/lib/engine/port-events';
import { portKindFromName } from '@/lib/engine/port-kind';
import { pistonDropMm } from '@/lib/engine/slider-crank';

const small = { strokeMm: 54, rodMm: 105 };
// Half-stroke drop: cos θ = a / 2l = 27 / 210 (law of cosines from Heywood eq. 2.5), θ = 82.6129515636983°.
const HALF_STROKE_OPENING_DEG = 82.6129515636983;

describe('portTiming', () => {
  it('opens where the crown passes the edge and closes as far before TDC', () => {
    const port = portTiming({ ...small, deckMm: 0, port: { name: 'Exhaust', heightMm: 27 } });
    expect(port.status).toBe('opens');
    expect(port.opensDegATDC).toBeCloseTo(HALF_STROKE_OPENING_DEG, 10);
    // Symmetric slider-crank (eq. 2.5 is even in θ): closing = 360 − opening.
    expect(port.closesDegATDC).toBeCloseTo(360 - HALF_STROKE_OPENING_DEG, 10);
    expect(port.opensDegBBDC).toBeCloseTo(180 - HALF_STROKE_OPENING_DEG, 10);
    // The crown really is at the edge at the opening angle (Heywood eq. 2.5).
    expect(pistonDropMm({ ...small, crankDeg: port.opensDegATDC as number })).toBeCloseTo(27, 9);
  });

  it('has duration = 360 − 2 × opening ATDC (common practice)', () => {
    for (const heightMm of [5, 18.5, 27, 33, 41.2, 53.9]) {
      const port = portTiming({ ...small, deckMm: 0.6, port: { name: 'Transfer', heightMm } });
      expect(port.durationDeg).toBeCloseTo(360 - 2 * (port.opensDegATDC as number), 12);
    }
    // 27 mm: 360 − 2 × 82.6129515636983 = 194.7740968726034°.
    expect(portTiming({ ...small, deckMm: 0, port: { name: 'E', heightMm: 27 } }).durationDeg).toBeCloseTo(194.7740968726034, 9);
  });

  it('measures the opening drop from the crown: deck below the top counts off, proud deck adds on', () => {
    const sunk = portTiming({ ...small, deckMm: 0.5, port: { name: 'Exhaust', heightMm: 27.5 } });
    const proud = portTiming({ ...small, deckMm: -0.5, port: { name: 'Exhaust', heightMm: 26.5 } });
    expect(sunk.openingDropMm).toBeCloseTo(27, 12);
    expect(proud.openingDropMm).toBeCloseTo(27, 12);
    expect(sunk.opensDegATDC).toBeCloseTo(HALF_STROKE_OPENING_DEG, 9);
    expect(proud.opensDegATDC).toBeCloseTo(HALF_STROKE_OPENING_DEG, 9);
  });

  it('opens at TDC for a port 0 mm below a zero deck', () => {
    const port = portTiming({ ...small, deckMm: 0, port: { name: 'Exhaust', heightMm: 0 } });
    expect(port.status).toBe('open-at-tdc');
    expect(port.opensDegATDC).toBe(0);
    expect(port.durationDeg).toBe(360);
    expect(port.note).toMatch(/Open at TDC/);
  });

  it('is open at TDC when the edge sits above the crown at TDC', () => {
    const port = portTiming({ ...small, deckMm: 1.2, port: { name: 'Exhaust', heightMm: 1 } });
    expect(port.status).toBe('open-at-tdc');
    expect(port.closesDegATDC).toBe(360);
  });

  it('never opens for a port at the stroke (or below BDC), and says so instead of NaN', () => {
    for (const heightMm of [54, 60]) {
      const port = portTiming({ ...small, deckMm: 0, port: { name: 'Exhaust', heightMm } });
      expect(port.status).toBe('never-opens');
      expect(port.opensDegATDC).toBeNull();
      expect(port.closesDegATDC).toBeNull();
      expect(port.durationDeg).toBe(0);
      expect(port.note).toMatch(/Never opens/);
    }
  });
});

describe('portTiming with a wrist-pin offset (offset slider-crank, R. L. Norton, Design of Machinery; from memory)', () => {
  // Independent geometry: crank pin at (a sin φ, a cos φ), wrist pin on the line x = e, rod l between them.
  const pinHeight = (phiRad: number, e: number) => 27 * Math.cos(phiRad) + Math.sqrt(105 ** 2 - (27 * Math.sin(phiRad) - e) ** 2);
  const crownDropAt = (crankDeg: number, e: number) => {
    const phiTdc = Math.asin(e / 132); // TDC where crank and rod line up: asin(e / (l + a))
    return pinHeight(phiTdc, e) - pinHeight(phiTdc + (crankDeg * Math.PI) / 180, e);
  };

  it('opens on the down-stroke and closes on the up-stroke at different angles: duration = closing − opening', () => {
    const port = portTiming({ ...small, pinOffsetMm: 1, deckMm: 0, port: { name: 'Exhaust', heightMm: 27 } });
    const opens = port.opensDegATDC as number;
    const closes = port.closesDegATDC as number;
    // The crown really is at the 27 mm edge at both angles (independent intersection above).
    expect(crownDropAt(opens, 1)).toBeCloseTo(27, 9);
    expect(crownDropAt(closes, 1)).toBeCloseTo(27, 9);
    expect(port.durationDeg).toBeCloseTo(closes - opens, 12);
    // Not symmetric any more: closing is not 360 − opening, so 360 − 2 × opening would be wrong.
    expect(Math.abs(closes - (360 - opens))).toBeGreaterThan(0.1);
    expect(Math.abs(port.durationDeg - (360 - 2 * opens))).toBeGreaterThan(0.1);
    // Opening BBDC is counted from the offset BDC, 180.30051831232024° ATDC (by hand with bc, offset-slider-crank.test.ts).
    expect(port.opensDegBBDC).toBeCloseTo(180.30051831232024 - opens, 9);
  });

  it('keeps the centred results exactly with a 0 mm offset', () => {
    const centred = portTiming({ ...small, deckMm: 0.6, port: { name: 'Transfer', heightMm: 41.2 } });
    expect(portTiming({ ...small, pinOffsetMm: 0, deckMm: 0.6, port: { name: 'Transfer', heightMm: 41.2 } })).toEqual(centred);
  });

  it('uses the true stroke for a port that never opens', () => {
    // True stroke with e = 1 is 54.0026 mm (bc, offset-slider-crank.test.ts): a 54 mm port now just opens, 54.01 mm never does.
    expect(portTiming({ ...small, pinOffsetMm: 1, deckMm: 0, port: { name: 'E', heightMm: 54 } }).status).toBe('opens');
    expect(portTiming({ ...small, pinOffsetMm: 1, deckMm: 0, port: { name: 'E', heightMm: 54.01 } }).status).toBe('never-opens');
  });
});

describe('portEvents', () => {
  it('times several ports at once and measures blowdown from exhaust to transfer opening', () => {
    const result = portEvents({
      ...small,
      deckMm: 0,
      ports: [
        { name: 'Exhaust', heightMm: 27 },
        { name: 'Transfer L', heightMm: 40 },
        { name: 'Transfer R', heightMm: 41 },
        { name: 'Boost', heightMm: 40.5 },
      ],
    });
    expect(result.ports.map((p) => p.kind)).toEqual(['exhaust', 'transfer', 'transfer', 'boost']);
    // Transfer at 40 mm: s = 132 − 40 = 92, cos θ = (92² + 27² − 105²) / (2·27·92) = −1832 / 4968, θ = 111.63916755423011°.
    expect(result.ports[1]?.opensDegATDC).toBeCloseTo(111.63916755423011, 9);
    // Blowdown = first transfer opening − exhaust opening = 111.63916755423011 − 82.6129515636983 = 29.02621599053181°.
    expect(result.blowdownDeg).toBeCloseTo(29.02621599053181, 9);
    expect(result.blowdownNote).toMatch(/Exhaust opens first/);
  });

  it('warns when the transfers open before the exhaust', () => {
    const result = portEvents({ ...small, deckMm: 0, ports: [{ name: 'Exhaust', heightMm: 35 }, { name: 'Transfer', heightMm: 30 }] });
    expect(result.blowdownDeg).toBeLessThan(0);
    expect(result.blowdownNote).toMatch(/blow back/);
  });

  it('has no blowdown without both an exhaust and a transfer that open', () => {
    const result = portEvents({ ...small, deckMm: 0, ports: [{ name: 'Exhaust', heightMm: 27 }, { name: 'Transfer', heightMm: 60 }] });
    expect(result.blowdownDeg).toBeNull();
    expect(result.blowdownNote).toMatch(/needs/);
  });

  it('takes an explicit kind over the name', () => {
    const result = portEvents({ ...small, deckMm: 0, ports: [{ name: 'A', heightMm: 27, kind: 'exhaust' }, { name: 'B', heightMm: 40, kind: 'transfer' }] });
    expect(result.blowdownDeg).toBeCloseTo(29.02621599053181, 9);
  });
});

describe('portKindFromName', () => {
  it('reads the usual names', () => {
    expect(portKindFromName('Exhaust')).toBe('exhaust');
    expect(portKindFromName('main transfer')).toBe('transfer');
    expect(portKindFromName('Boost port')).toBe('boost');
    expect(portKindFromName('Inlet')).toBe('inlet');
    expect(portKindFromName('Window 3')).toBe('other');
  });
});
