import { describe, expect, it } from 'vitest';
import { arcChordSchema } from '@/lib/engine/arc-chord-schema';
import { crankAngleSchema } from '@/lib/engine/crank-angle-schema';
import { pistonDropSchema } from '@/lib/engine/piston-drop-schema';
import { portEventsSchema } from '@/lib/engine/port-events-schema';
import { tdcSchema } from '@/lib/engine/tdc-schema';

function issues(result: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) {
  return (result.error?.issues ?? []).map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
}

describe('calculator schemas accept good input', () => {
  it('parses each calculator’s example', () => {
    expect(pistonDropSchema.safeParse({ strokeMm: 54, rodMm: 105, crankDeg: 18 }).success).toBe(true);
    expect(pistonDropSchema.safeParse({ strokeMm: 54, rodMm: 105, crankDeg: 18, pinOffsetMm: 0 }).success).toBe(true);
    expect(pistonDropSchema.safeParse({ strokeMm: 54, rodMm: 105, crankDeg: 18, pinOffsetMm: -1.5 }).success).toBe(true);
    expect(crankAngleSchema.safeParse({ strokeMm: 54, rodMm: 105, dropMm: 54.002, pinOffsetMm: 1 }).success).toBe(true);
    expect(crankAngleSchema.safeParse({ strokeMm: 54, rodMm: 105, dropMm: 54 }).success).toBe(true);
    expect(portEventsSchema.safeParse({ strokeMm: 54, rodMm: 105, deckMm: -0.4, ports: [{ name: 'Exhaust', heightMm: 27 }] }).success).toBe(true);
    expect(tdcSchema.safeParse({ numbering: 'split', readingADeg: 25, readingASide: 'BTDC', readingBDeg: 0 }).success).toBe(true);
    expect(arcChordSchema.parse({ diameterMm: 120, anglesDeg: '16, 18 20' }).anglesDeg).toEqual([16, 18, 20]);
  });
});

describe('every field out of range answers its own message with the allowed range', () => {
  const cases: Array<[string, { safeParse: (v: unknown) => never | { success: boolean } }, unknown, string, RegExp]> = [
    ['stroke', pistonDropSchema, { strokeMm: 0.5, rodMm: 105, crankDeg: 10 }, 'strokeMm', /Stroke.*1–300 mm/],
    ['rod vs throw', pistonDropSchema, { strokeMm: 54, rodMm: 26, crankDeg: 10 }, 'rodMm', /Con-rod length.*over 27 up to 1000 mm/],
    ['rod range', pistonDropSchema, { strokeMm: 54, rodMm: 2000, crankDeg: 10 }, 'rodMm', /Con-rod length.*1–1000 mm/],
    ['crank angle', pistonDropSchema, { strokeMm: 54, rodMm: 105, crankDeg: -1 }, 'crankDeg', /Crank angle.*0–360°/],
    ['pin offset', pistonDropSchema, { strokeMm: 54, rodMm: 105, crankDeg: 10, pinOffsetMm: 5.5 }, 'pinOffsetMm', /Wrist-pin offset.*-5 to 5 mm/],
    // |e| ≥ l − a: the rod cannot reach the offset bore line at BDC (offset slider-crank, Norton, Design of Machinery; from memory).
    ['locked by offset', pistonDropSchema, { strokeMm: 54, rodMm: 30, crankDeg: 10, pinOffsetMm: -3 }, 'pinOffsetMm', /Wrist-pin offset.*con-rod length minus crank throw \(3 mm\)/],
    ['crank angle offset', crankAngleSchema, { strokeMm: 54, rodMm: 105, dropMm: 10, pinOffsetMm: 'x' }, 'pinOffsetMm', /Wrist-pin offset.*must be a number/],
    // True stroke with e = 1 is 54.0026 mm (by hand with bc in offset-slider-crank.test.ts).
    ['drop beyond offset stroke', crankAngleSchema, { strokeMm: 54, rodMm: 105, dropMm: 54.01, pinOffsetMm: 1 }, 'dropMm', /Piston drop.*pin offset.*0–54\.003 mm/],
    ['port offset', portEventsSchema, { strokeMm: 54, rodMm: 105, deckMm: 0, pinOffsetMm: -7, ports: [{ name: 'E', heightMm: 27 }] }, 'pinOffsetMm', /Wrist-pin offset.*-5 to 5 mm/],
    ['drop beyond stroke', crankAngleSchema, { strokeMm: 54, rodMm: 105, dropMm: 55 }, 'dropMm', /Piston drop.*0–54 mm/],
    ['negative drop', crankAngleSchema, { strokeMm: 54, rodMm: 105, dropMm: -1 }, 'dropMm', /Piston drop.*at least 0 mm/],
    ['deck', portEventsSchema, { strokeMm: 54, rodMm: 105, deckMm: 30, ports: [{ name: 'E', heightMm: 27 }] }, 'deckMm', /Deck height.*-20 to 20 mm/],
    ['port height', portEventsSchema, { strokeMm: 54, rodMm: 105, deckMm: 0, ports: [{ name: 'E', heightMm: -2 }] }, 'ports.0.heightMm', /Port edge height.*0–400 mm/],
    ['port name', portEventsSchema, { strokeMm: 54, rodMm: 105, deckMm: 0, ports: [{ name: ' ', heightMm: 2 }] }, 'ports.0.name', /Port name/],
    ['no ports', portEventsSchema, { strokeMm: 54, rodMm: 105, deckMm: 0, ports: [] }, 'ports', /1–12 ports/],
    ['port kind', portEventsSchema, { strokeMm: 54, rodMm: 105, deckMm: 0, ports: [{ name: 'E', heightMm: 2, kind: 'x' }] }, 'ports.0.kind', /Port kind.*exhaust, transfer/],
    ['numbering', tdcSchema, { numbering: 'half', readingADeg: 1, readingBDeg: 2 }, 'numbering', /full, split/],
    ['reading A', tdcSchema, { numbering: 'full', readingADeg: 361, readingBDeg: 2 }, 'readingADeg', /Reading A.*0–360°/],
    ['reading B split', tdcSchema, { numbering: 'split', readingADeg: 0, readingBDeg: 200, readingBSide: 'ATDC' }, 'readingBDeg', /Reading B.*0–180°/],
    ['split side', tdcSchema, { numbering: 'split', readingADeg: 20, readingBDeg: 20, readingBSide: 'ATDC' }, 'readingASide', /Reading A side.*BTDC or ATDC/],
    ['opposite readings', tdcSchema, { numbering: 'full', readingADeg: 10, readingBDeg: 190 }, 'readingBDeg', /180°/],
    ['diameter', arcChordSchema, { diameterMm: 5, anglesDeg: [1] }, 'diameterMm', /Diameter.*20–600 mm/],
    ['angle', arcChordSchema, { diameterMm: 100, anglesDeg: [10, 400] }, 'anglesDeg.1', /Angle.*0–360°/],
    ['angle text', arcChordSchema, { diameterMm: 100, anglesDeg: '10, ten' }, 'anglesDeg.1', /Angle.*number/],
  ];

  for (const [label, schema, input, path, message] of cases) {
    it(`${label}: ${path}`, () => {
      const found = issues(schema.safeParse(input) as never);
      expect(found.length).toBeGreaterThan(0);
      expect(found).toContainEqual({ path, message: expect.stringMatching(message) });
      expect(found.every((issue) => issue.path === path)).toBe(true);
      // Messages speak the label, never the JSON key.
      const key = path.split('.').filter((part) => !/^\d+$/.test(part)).at(-1)!;
      expect(found.every((issue) => !issue.message.includes(`(${key})`))).toBe(true);
    });
  }
});
