import { describe, expect, it } from 'vitest';
import { prefillFromSearchParams } from '@/lib/generator-prefill';

// Ranges come from the shared sheet request schema (issue 3: diameters 20–600 mm, advance
// marks 0–60° BTDC, at most 72 of them); the prefill must keep what is valid and drop the rest.

describe('prefillFromSearchParams', () => {
  it('reads a calculator link into form defaults', () => {
    const params = new URLSearchParams({
      kind: 'wheel',
      diameterMm: '118.5',
      numbering: 'full',
      rotation: 'ccw',
      advanceMarksDeg: '16, 17, 18',
      portEvents: JSON.stringify([{ name: 'Exhaust', opensCrankDeg: 97, closesCrankDeg: 263 }]),
      windowCrankDeg: '320,10',
      title: 'Bench wheel',
    });
    const { values, ignored } = prefillFromSearchParams(params);
    expect(ignored).toEqual([]);
    expect(values).toEqual({
      kind: 'wheel',
      diameterMm: 118.5,
      numbering: 'full',
      rotation: 'ccw',
      advanceMarksDeg: [16, 17, 18],
      portEvents: [{ name: 'Exhaust', opensCrankDeg: 97, closesCrankDeg: 263 }],
      windowCrankDeg: [320, 10],
      title: 'Bench wheel',
    });
  });

  it('accepts a Next.js searchParams record, taking the first of repeated values', () => {
    const { values } = prefillFromSearchParams({ kind: ['strip', 'wheel'], diameterMm: '130', other: 'x' });
    expect(values).toEqual({ kind: 'strip', diameterMm: 130 });
  });

  it('ignores bad JSON in portEvents without throwing', () => {
    const { values, ignored } = prefillFromSearchParams(new URLSearchParams({ portEvents: '[{"name":' }));
    expect(values.portEvents).toBeUndefined();
    expect(ignored).toEqual([{ param: 'portEvents', message: 'Port events are not valid JSON' }]);
  });

  it('keeps the valid port events and drops the broken ones', () => {
    const events = [
      { name: 'Transfer', opensCrankDeg: 122, closesCrankDeg: 238 },
      { name: 'Bad', opensCrankDeg: 400, closesCrankDeg: 10 },
      'nonsense',
    ];
    const { values, ignored } = prefillFromSearchParams(new URLSearchParams({ portEvents: JSON.stringify(events) }));
    expect(values.portEvents).toEqual([events[0]]);
    expect(ignored).toHaveLength(2);
    expect(ignored[0]?.message).toMatch(/Port opening angle.*360/);
  });

  it('refuses out-of-range numbers (diameter 700 mm) and names the field and range', () => {
    const { values, ignored } = prefillFromSearchParams(new URLSearchParams({ diameterMm: '700', hubHoleMm: '-3' }));
    expect(values).toEqual({});
    expect(ignored.map((i) => i.param)).toEqual(['diameterMm', 'hubHoleMm']);
    expect(ignored[0]?.message).toMatch(/Diameter.*600 mm/);
  });

  it('refuses non-numbers and unknown choices', () => {
    const { values, ignored } = prefillFromSearchParams(
      new URLSearchParams({ diameterMm: 'abc', kind: 'teapot', paper: 'B5', carrier: 'stationary' }),
    );
    expect(values).toEqual({ carrier: 'stationary' });
    expect(ignored.map((i) => i.param).sort()).toEqual(['diameterMm', 'kind', 'paper']);
    expect(ignored.find((i) => i.param === 'kind')?.message).toMatch(/wheel, ring, strip, scribe, check/);
  });

  it('keeps the valid advance marks of a list and drops 75 and "x"', () => {
    const { values, ignored } = prefillFromSearchParams(new URLSearchParams({ advanceMarksDeg: '18, 75, x, 20' }));
    expect(values.advanceMarksDeg).toEqual([18, 20]);
    expect(ignored).toHaveLength(2);
    expect(ignored[0]?.message).toMatch(/60° BTDC/);
  });

  it('caps the advance marks at 72', () => {
    const list = Array.from({ length: 80 }, (_, i) => (i % 60).toString()).join(',');
    const { values, ignored } = prefillFromSearchParams(new URLSearchParams({ advanceMarksDeg: list }));
    expect(values.advanceMarksDeg).toHaveLength(72);
    expect(ignored.at(-1)?.message).toMatch(/first 72/);
  });

  it('refuses a window that is not two angles', () => {
    const { values, ignored } = prefillFromSearchParams(new URLSearchParams({ windowCrankDeg: '320', advanceBandDeg: '16,22' }));
    expect(values).toEqual({ advanceBandDeg: [16, 22] });
    expect(ignored.map((i) => i.param)).toEqual(['windowCrankDeg']);
  });

  it('reads the strobe-readable option as true or false and names it when it is neither', () => {
    expect(prefillFromSearchParams(new URLSearchParams('strobeReadable=true')).values.strobeReadable).toBe(true);
    expect(prefillFromSearchParams(new URLSearchParams('strobeReadable=false')).values.strobeReadable).toBe(false);
    const bad = prefillFromSearchParams(new URLSearchParams('strobeReadable=yes&targetAdvanceDeg=61'));
    expect(bad.values).not.toHaveProperty('strobeReadable');
    expect(bad.ignored.map((i) => i.param).sort()).toEqual(['strobeReadable', 'targetAdvanceDeg']);
    expect(bad.ignored.find((i) => i.param === 'strobeReadable')?.message).toBe('Strobe-readable must be true or false');
    expect(bad.ignored.find((i) => i.param === 'targetAdvanceDeg')?.message).toMatch(/^Target advance .*0–60° BTDC/);
  });

  it('refuses an over-long title but keeps the rest', () => {
    const { values, ignored } = prefillFromSearchParams(new URLSearchParams({ title: 'x'.repeat(81), kind: 'ring' }));
    expect(values).toEqual({ kind: 'ring' });
    expect(ignored[0]?.message).toMatch(/at most 80 characters/);
  });
});
