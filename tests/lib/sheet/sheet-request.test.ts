import { describe, expect, it } from 'vitest';
import { crossFieldIssues, issueInUnit, LENGTH_KEYS, sheetRequestSchema, toFieldIssues } from '@/lib/sheet/sheet-request';

// 1 in = 25.4 mm exactly (international inch, 1959; NIST SP 811 appendix B). Inch values written out by hand.

const base = { kind: 'wheel' as const, hubHoleMm: 0, fromDeg: 0, toDeg: 40, stepDeg: 1 };

describe('sheetRequestSchema', () => {
  it('names each field by its label with the allowed range, never by its JSON key', () => {
    const result = sheetRequestSchema.safeParse({ kind: 'strip', diameterMm: 700, stripWidthMm: 2, title: 7 });
    expect(toFieldIssues(result.error!)).toEqual([
      { path: 'diameterMm', message: 'Diameter must be at most 600 mm (allowed 20–600 mm)' },
      { path: 'stripWidthMm', message: 'Strip width must be at least 6 mm (allowed 6–40 mm)' },
      { path: 'title', message: 'Title must be text, up to 80 characters' },
    ]);
  });

  it('asks for the diameter a kind needs, with its range', () => {
    expect(toFieldIssues(sheetRequestSchema.safeParse({ kind: 'ring', outerDiameterMm: 150 }).error!)).toEqual([
      { path: 'innerDiameterMm', message: 'Inner diameter is required for a ring sheet (allowed 20–600 mm)' },
    ]);
  });
});

describe('LENGTH_KEYS', () => {
  it('lists the length fields of the table (the ones a form shows in mm or inches)', () => {
    expect(LENGTH_KEYS).toEqual(['diameterMm', 'hubHoleMm', 'innerDiameterMm', 'outerDiameterMm', 'stripWidthMm']);
  });
});

describe('crossFieldIssues', () => {
  it('writes the other length in the unit asked for: 150 mm, or 127 mm = 5 in', () => {
    const ring = { ...base, kind: 'ring' as const, innerDiameterMm: 160, outerDiameterMm: 127 };
    expect(crossFieldIssues(ring, 'mm')).toEqual([{ path: 'innerDiameterMm', message: 'Inner diameter must be smaller than the outer diameter (127 mm)' }]);
    expect(crossFieldIssues(ring, 'in')).toEqual([{ path: 'innerDiameterMm', message: 'Inner diameter must be smaller than the outer diameter (5 in)' }]);
  });

  it('gives the required range in inches rounded inwards (20–600 mm is 0.788–23.622 in)', () => {
    expect(crossFieldIssues(base, 'in')).toEqual([{ path: 'diameterMm', message: 'Diameter is required for a wheel sheet (allowed 0.788–23.622 in)' }]);
  });
});

describe('issueInUnit', () => {
  const strip = { ...base, kind: 'strip' as const, diameterMm: 101.6 };

  it('restates a length field’s range from the field’s own range, by the issue’s code', () => {
    // 6 mm = 0.23622… in → 0.237; 40 mm = 1.574803… in → 1.574.
    const issue = { path: 'stripWidthMm', code: 'too_big', message: 'Strip width must be at most 40 mm (allowed 6–40 mm)' };
    expect(issueInUnit(issue, strip, 'in')).toBe('Strip width must be at most 1.574 in (allowed 0.237–1.574 in)');
    expect(issueInUnit({ ...issue, code: 'too_small' }, strip, 'in')).toBe('Strip width must be at least 0.237 in (allowed 0.237–1.574 in)');
  });

  it('leaves mm, and fields that are not lengths, as the schema wrote them', () => {
    const issue = { path: 'stripWidthMm', code: 'too_big', message: 'as the schema wrote it' };
    expect(issueInUnit(issue, strip, 'mm')).toBe('as the schema wrote it');
    expect(issueInUnit({ ...issue, path: 'paperThicknessMm' }, strip, 'in')).toBe('as the schema wrote it');
  });
});
