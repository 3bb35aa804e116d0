import { describe, expect, it } from 'vitest';
import { textWidthMm } from '@/lib/sheet/sheet-style';
import fc from 'fast-check';
import { wordLengthsOf, wrappedLineCount, wrapText } from '@/lib/sheet/text-wrap';

// Greedy ("first fit") line breaking, as in Knuth & Plass, "Breaking Paragraphs into Lines" (1981), §1: each line
// takes words while the next one still fits.
const STEP = 'Find TDC with a positive stop in the plug hole: turn the engine by hand against the stop one way, then the other.';

describe('wrapText', () => {
  it('keeps every word in order and every line within the width', () => {
    for (const widthMm of [20, 33.3, 50, 81.7]) {
      const lines = wrapText(STEP, 2, widthMm);
      expect(lines.join(' ')).toBe(STEP);
      for (const line of lines) expect(textWidthMm(line, 2)).toBeLessThanOrEqual(widthMm);
    }
  });

  it('breaks greedily: no line could have taken the first word of the next', () => {
    const lines = wrapText(STEP, 2, 40);
    for (let i = 0; i + 1 < lines.length; i += 1) {
      const nextWord = lines[i + 1]!.split(' ')[0]!;
      expect(textWidthMm(`${lines[i]} ${nextWord}`, 2)).toBeGreaterThan(40);
    }
  });

  it('cuts a word wider than the line into pieces that fit, and keeps paragraphs apart', () => {
    const long = 'w'.repeat(50);
    const lines = wrapText(`short ${long} end\nnext paragraph`, 2, 20);
    for (const line of lines) expect(textWidthMm(line, 2)).toBeLessThanOrEqual(20);
    expect(lines.join('').replace(/[^w]/g, '')).toBe(long);
    expect(lines.at(-1)).toBe('next paragraph');
    expect(lines).not.toContain('end next');
  });

  it('collapses runs of white space to one space and gives one empty line for an empty paragraph', () => {
    expect(wrapText('  a \t b  ', 2, 100)).toEqual(['a b']);
    expect(wrapText('', 2, 100)).toEqual(['']);
  });
});

describe('wrappedLineCount', () => {
  it('counts the lines wrapText gives, for any words, sizes and widths', () => {
    // Words of letters (a surrogate pair counts two, as String.length does), parted by any run of what /\s/ matches.
    const word = fc.stringMatching(/^(?:[a-z0-9.,:%°’]|\u{1F527}){1,40}$/u);
    const space = fc.constantFrom(' ', '  ', '\t', '\u00a0', '\u202f', '\u2028', '\r', ' \u3000 ');
    const paragraph = fc.array(fc.tuple(word, space), { maxLength: 30 }).map((pairs) => pairs.map(([w, gap]) => w + gap).join(''));
    const lead = fc.constantFrom('', ' ', '\t ');
    fc.assert(
      fc.property(fc.array(fc.tuple(lead, paragraph).map(([l, p]) => l + p), { minLength: 1, maxLength: 4 }), fc.double({ min: 1, max: 5, noNaN: true }), fc.double({ min: 2, max: 200, noNaN: true }), (paragraphs, sizeMm, widthMm) => {
        const content = paragraphs.join('\n');
        expect(wrappedLineCount(wordLengthsOf(content), sizeMm, widthMm)).toBe(wrapText(content, sizeMm, widthMm).length);
      }),
      { numRuns: 500 },
    );
  });
});

