import { describe, expect, it } from 'vitest';
import { detectDelimiter } from '@/lib/csv/detect-delimiter';

describe('detectDelimiter', () => {
  it('reads the delimiter from the header row, not from list cells or decimal commas below it', () => {
    expect(detectDelimiter('name,bore_mm,advance_marks_deg_btdc\nA,40,16;17;18;19;20\n')).toBe(',');
    expect(detectDelimiter('name;bore_mm;stroke_mm\nA;40,5;39,2\n')).toBe(';');
    expect(detectDelimiter('name\tbore_mm\nA\t40\n')).toBe('\t');
  });

  it('ignores delimiters inside a quoted header and takes comma for a single column', () => {
    expect(detectDelimiter('"a;b;c",x\n')).toBe(',');
    expect(detectDelimiter('name\nOnly\n')).toBe(',');
  });
});
