import { describe, expect, it } from 'vitest';
import { POST as arcChord } from '@/app/api/v1/calc/arc-chord/route';
import { POST as crankAngle } from '@/app/api/v1/calc/crank-angle/route';
import { POST as pistonDrop } from '@/app/api/v1/calc/piston-drop/route';
import { POST as portEventsRoute } from '@/app/api/v1/calc/port-events/route';
import { POST as tdc } from '@/app/api/v1/calc/tdc/route';

type Handler = (request: Request) => Promise<Response>;

async function post(handler: Handler, body: unknown) {
  const text = typeof body === 'string' ? body : JSON.stringify(body);
  const response = await handler(
    new Request('http://localhost/api/v1/calc', { method: 'POST', headers: { 'content-type': 'application/json' }, body: text }),
  );
  return { status: response.status, body: await response.json() };
}

describe('POST /api/v1/calc/piston-drop', () => {
  it('answers the drop from Heywood eq. 2.5', async () => {
    // Heywood eq. 2.5, a = 27, l = 105, θ = 90°: drop = 132 − √10296 = 30.530792848273423 mm (by hand).
    const { status, body } = await post(pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: 90 });
    expect(status).toBe(200);
    expect(body.dropMm).toBeCloseTo(30.530792848273423, 10);
  });

  it('answers the stroke at 180° (eq. 2.5: s = l − a)', async () => {
    const { body } = await post(pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: 180, pinOffsetMm: 0 });
    expect(body.dropMm).toBeCloseTo(54, 12);
  });
});

describe('POST /api/v1/calc/piston-drop with a wrist-pin offset', () => {
  it('answers the offset slider-crank drop', async () => {
    // Offset slider-crank (Norton, Design of Machinery; from memory), checked by the independent intersection:
    // crank pin at (a sin φ, a cos φ), wrist pin on x = e, φ = φ_TDC + θ, φ_TDC = asin(e / (l + a)).
    const a = 27;
    const l = 105;
    const e = 1;
    const y = (phi: number) => a * Math.cos(phi) + Math.sqrt(l * l - (a * Math.sin(phi) - e) ** 2);
    const phiTdc = Math.asin(e / (l + a));
    for (const crankDeg of [18, 90, 342]) {
      const { status, body } = await post(pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg, pinOffsetMm: 1 });
      expect(status).toBe(200);
      expect(body.dropMm).toBeCloseTo(y(phiTdc) - y(phiTdc + (crankDeg * Math.PI) / 180), 9);
    }
    // 18° ATDC and 18° BTDC (342) no longer give the same drop with an offset (about 0.002 mm apart for e = 1).
    const after = await post(pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: 18, pinOffsetMm: 1 });
    const before = await post(pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: 342, pinOffsetMm: 1 });
    expect(Math.abs(after.body.dropMm - before.body.dropMm)).toBeGreaterThan(0.001);
  });
});

describe('POST /api/v1/calc/crank-angle', () => {
  it('answers both sides of TDC with a pin offset, and the three equal without', async () => {
    const centred = await post(crankAngle, { strokeMm: 54, rodMm: 105, dropMm: 27 });
    // acos(a / 2l) at half stroke (law of cosines from Heywood eq. 2.5).
    expect(centred.body.crankDegATDC).toBeCloseTo(82.6129515636983, 10);
    expect(centred.body.crankDegBTDC).toBe(centred.body.crankDeg);
    const { status, body } = await post(crankAngle, { strokeMm: 54, rodMm: 105, dropMm: 27, pinOffsetMm: 1 });
    expect(status).toBe(200);
    expect(body.crankDeg).toBe(body.crankDegATDC);
    expect(body.crankDegATDC).toBeGreaterThan(body.crankDegBTDC);
    // Both angles put the piston at 27 mm (round trip through the piston-drop route).
    const down = await post(pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: body.crankDegATDC, pinOffsetMm: 1 });
    const up = await post(pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: 360 - body.crankDegBTDC, pinOffsetMm: 1 });
    expect(down.body.dropMm).toBeCloseTo(27, 9);
    expect(up.body.dropMm).toBeCloseTo(27, 9);
  });


  it('answers degrees from TDC', async () => {
    // cos θ = a / 2l = 27/210 at half stroke (law of cosines from eq. 2.5): θ = 82.6129515636983°.
    const { status, body } = await post(crankAngle, { strokeMm: 54, rodMm: 105, dropMm: 27 });
    expect(status).toBe(200);
    expect(body.crankDeg).toBeCloseTo(82.6129515636983, 10);
  });
});

describe('POST /api/v1/calc/port-events', () => {
  it('answers each port and the blowdown', async () => {
    const { status, body } = await post(portEventsRoute, {
      strokeMm: 54,
      rodMm: 105,
      deckMm: 0,
      ports: [{ name: 'Exhaust', heightMm: 27 }, { name: 'Transfer', heightMm: 40 }, { name: 'Low', heightMm: 54 }],
    });
    expect(status).toBe(200);
    expect(body.ports[0].name).toBe('Exhaust');
    expect(body.ports[0].opensDegATDC).toBeCloseTo(82.6129515636983, 9);
    expect(body.ports[0].closesDegATDC).toBeCloseTo(277.3870484363017, 9);
    // Duration = 360 − 2 × opening ATDC (common practice).
    expect(body.ports[0].durationDeg).toBeCloseTo(194.7740968726034, 9);
    // Transfer at 40 mm: cos θ = −1832/4968, θ = 111.63916755423011°; blowdown = 29.02621599053181°.
    expect(body.blowdownDeg).toBeCloseTo(29.02621599053181, 9);
    // A port at the stroke never opens: null angles and a note, never NaN.
    expect(body.ports[2]).toMatchObject({ status: 'never-opens', opensDegATDC: null, closesDegATDC: null, durationDeg: 0 });
  });

  it('answers asymmetric timing with a pin offset: duration = closing − opening', async () => {
    const { status, body } = await post(portEventsRoute, { strokeMm: 54, rodMm: 105, deckMm: 0, pinOffsetMm: 1, ports: [{ name: 'Exhaust', heightMm: 27 }] });
    expect(status).toBe(200);
    const [exhaust] = body.ports;
    expect(exhaust.durationDeg).toBeCloseTo(exhaust.closesDegATDC - exhaust.opensDegATDC, 12);
    expect(Math.abs(exhaust.durationDeg - (360 - 2 * exhaust.opensDegATDC))).toBeGreaterThan(0.1);
  });
});

describe('POST /api/v1/calc/tdc', () => {
  it('answers TDC across the 0/360 seam', async () => {
    const { status, body } = await post(tdc, { numbering: 'full', readingADeg: 340, readingBDeg: 30 });
    expect(status).toBe(200);
    // Midpoint of the 50° sweep 340 → 30 is 5° (common practice: TDC midway between the stops).
    expect(body.tdcReadingDeg).toBeCloseTo(5, 12);
    expect(body.correctionDeg).toBeCloseTo(-5, 12);
    expect(body.stopAngleDeg).toBeCloseTo(25, 12);
  });

  it('answers split readings with a side', async () => {
    const { body } = await post(tdc, { numbering: 'split', readingADeg: 25, readingASide: 'BTDC', readingBDeg: 25, readingBSide: 'ATDC' });
    expect(body).toMatchObject({ tdcReadingDeg: 0, tdcReadingSide: 'TDC', correctionDeg: 0, stopAngleDeg: 25 });
  });
});

describe('POST /api/v1/calc/arc-chord', () => {
  it('answers one row per angle', async () => {
    const { status, body } = await post(arcChord, { diameterMm: 120, anglesDeg: [60, 180] });
    expect(status).toBe(200);
    // Chord at 60° = radius (equilateral triangle); at 180° = diameter; arc = π·D·θ/360.
    expect(body.rows[0].chordMm).toBeCloseTo(60, 12);
    expect(body.rows[0].arcMm).toBeCloseTo(20 * Math.PI, 12);
    expect(body.rows[1].chordMm).toBeCloseTo(120, 12);
  });
});

describe('bad input answers 400 with the API error shape, one message per field', () => {
  const cases: Array<[string, Handler, unknown, string, RegExp]> = [
    ['stroke', pistonDrop, { strokeMm: -54, rodMm: 105, crankDeg: 10 }, 'strokeMm', /Stroke.*1–300 mm/],
    ['rod', pistonDrop, { strokeMm: 54, rodMm: 20, crankDeg: 10 }, 'rodMm', /Con-rod length.*longer than the crank throw.*over 27 up to 1000 mm/],
    ['crank angle', pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: 400 }, 'crankDeg', /Crank angle.*0–360°/],
    ['crank angle text', pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: '10' }, 'crankDeg', /Crank angle.*must be a number/],
    ['pin offset', pistonDrop, { strokeMm: 54, rodMm: 105, crankDeg: 10, pinOffsetMm: 5.5 }, 'pinOffsetMm', /Wrist-pin offset.*-5 to 5 mm/],
    ['locked mechanism', pistonDrop, { strokeMm: 54, rodMm: 30, crankDeg: 10, pinOffsetMm: 3.5 }, 'pinOffsetMm', /Wrist-pin offset.*con-rod length minus crank throw \(3 mm\).*cannot pass BDC/],
    ['crank-angle offset', crankAngle, { strokeMm: 54, rodMm: 105, dropMm: 10, pinOffsetMm: -6 }, 'pinOffsetMm', /Wrist-pin offset.*-5 to 5 mm/],
    ['port-events offset', portEventsRoute, { strokeMm: 54, rodMm: 30, deckMm: 0, pinOffsetMm: 4, ports: [{ name: 'E', heightMm: 20 }] }, 'pinOffsetMm', /Wrist-pin offset.*con-rod length minus crank throw/],
    ['drop', crankAngle, { strokeMm: 54, rodMm: 105, dropMm: 60 }, 'dropMm', /Piston drop.*0–54 mm/],
    ['missing drop', crankAngle, { strokeMm: 54, rodMm: 105 }, 'dropMm', /Piston drop.*must be a number/],
    ['deck', portEventsRoute, { strokeMm: 54, rodMm: 105, deckMm: -25, ports: [{ name: 'E', heightMm: 20 }] }, 'deckMm', /Deck height.*-20 to 20 mm/],
    ['port height', portEventsRoute, { strokeMm: 54, rodMm: 105, deckMm: 0, ports: [{ name: 'E', heightMm: 500 }] }, 'ports.0.heightMm', /Port edge height.*0–400 mm/],
    ['ports', portEventsRoute, { strokeMm: 54, rodMm: 105, deckMm: 0, ports: 'E' }, 'ports', /Ports.*list/],
    ['numbering', tdc, { numbering: 'both', readingADeg: 1, readingBDeg: 2 }, 'numbering', /Numbering.*full, split/],
    ['reading B', tdc, { numbering: 'full', readingADeg: 1, readingBDeg: -2 }, 'readingBDeg', /Reading B.*0–360°/],
    ['split side', tdc, { numbering: 'split', readingADeg: 10, readingASide: 'ATDC', readingBDeg: 12, readingBSide: 'left' }, 'readingBSide', /Reading B side must be one of: BTDC, ATDC/],
    ['diameter', arcChord, { diameterMm: 700, anglesDeg: [10] }, 'diameterMm', /Diameter.*20–600 mm/],
    ['angles', arcChord, { diameterMm: 100, anglesDeg: [] }, 'anglesDeg', /Angle.*1–400/],
  ];

  for (const [label, handler, body, path, message] of cases) {
    it(`${label}: ${path}`, async () => {
      const response = await post(handler, body);
      expect(response.status).toBe(400);
      expect(response.body.error).toBe('Some fields are not valid');
      expect(response.body.issues).toContainEqual({ path, message: expect.stringMatching(message) });
      expect(response.body.issues.every((issue: { path: string }) => issue.path === path)).toBe(true);
    });
  }

  it('answers a body that is not JSON', async () => {
    const response = await post(pistonDrop, '{ strokeMm: 54');
    expect(response.status).toBe(400);
    expect(response.body.issues[0].path).toBe('(body)');
  });
});
