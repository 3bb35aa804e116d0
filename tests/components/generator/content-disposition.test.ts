import { describe, expect, it } from 'vitest';
import { fileNameFromContentDisposition } from '@/components/generator/content-disposition';

// Header forms from RFC 6266 §4.1 and its examples (§5); RFC 8187 for the filename* encoding.

describe('fileNameFromContentDisposition', () => {
  it('reads a quoted filename', () => {
    expect(fileNameFromContentDisposition('attachment; filename="wheel-120mm.pdf"', 'x')).toBe('wheel-120mm.pdf');
  });

  it('reads a token filename', () => {
    expect(fileNameFromContentDisposition('Attachment; filename=example.html', 'x')).toBe('example.html');
  });

  it('prefers filename* (RFC 8187, UTF-8, percent-encoded) over filename', () => {
    const header = `attachment; filename="EURO rates"; filename*=utf-8''%e2%82%ac%20rates`;
    expect(fileNameFromContentDisposition(header, 'x')).toBe('€ rates');
  });

  it('unescapes quoted pairs and strips path parts', () => {
    expect(fileNameFromContentDisposition('attachment; filename="a\\"b.svg"', 'x')).toBe('a"b.svg');
    expect(fileNameFromContentDisposition('attachment; filename="../../etc/strip.svg"', 'x')).toBe('strip.svg');
  });

  it('falls back when the header is missing or has no name', () => {
    expect(fileNameFromContentDisposition(null, 'rimscale-sheet.pdf')).toBe('rimscale-sheet.pdf');
    expect(fileNameFromContentDisposition('attachment', 'rimscale-sheet.svg')).toBe('rimscale-sheet.svg');
    expect(fileNameFromContentDisposition("attachment; filename*=UTF-8''%E0%A4%A", 'fallback.pdf')).toBe('fallback.pdf');
  });
});
