import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { guardCell, unguardCell } from '@/lib/csv/formula-guard';

describe('guardCell', () => {
  it('prefixes cells that a spreadsheet would run as a formula (OWASP "CSV Injection")', () => {
    for (const cell of ['=cmd|calc', '+1+2', '-2+3', '@SUM(A1)', '\t=1', '\r=1', '=1+2:92/268;transfer:118/242']) expect(guardCell(cell)).toBe(`'${cell}`);
  });

  it('leaves plain text and plain numbers alone', () => {
    for (const cell of ['exhaust:92/268', 'Kart 100', '-5', '+3.5', '17;18', '']) expect(guardCell(cell)).toBe(cell);
  });

  it('round-trips every string', () => {
    fc.assert(fc.property(fc.string(), (cell) => unguardCell(guardCell(cell)) === cell));
  });
});
