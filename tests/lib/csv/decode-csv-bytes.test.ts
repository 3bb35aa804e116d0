import { describe, expect, it } from 'vitest';
import { decodeCsvBytes } from '@/lib/csv/decode-csv-bytes';

const utf8 = (text: string) => new TextEncoder().encode(text);

describe('decodeCsvBytes', () => {
  it('reads valid UTF-8', () => {
    expect(decodeCsvBytes(utf8('name\n10° BTDC\n'))).toEqual({ ok: true, text: 'name\n10° BTDC\n', encoding: 'utf-8' });
  });

  it('names the row of the first byte that is not UTF-8 (RFC 3629), counting a quoted line break as part of its row', () => {
    // 0xE9 is é in ISO-8859-1, a lone lead byte in UTF-8.
    const bytes = new Uint8Array([...utf8('name,notes\nA,"two\nlines"\nB,caf'), 0xe9, ...utf8('\n')]);
    const decoded = decodeCsvBytes(bytes);
    expect(decoded.ok).toBe(false);
    if (!decoded.ok) {
      expect(decoded.row).toBe(3);
      expect(decoded.message).toMatch(/byte 0xE9/);
    }
  });

  it('refuses overlong and surrogate encodings like the WHATWG fatal decoder does', () => {
    for (const bad of [[0xc0, 0xaf], [0xed, 0xa0, 0x80], [0xf4, 0x90, 0x80, 0x80]]) {
      expect(decodeCsvBytes(new Uint8Array([0x41, 0x0a, ...bad])).ok).toBe(false);
    }
  });

  it('decodes by byte-order mark (UTF-8, UTF-16LE) or by declared charset', () => {
    expect(decodeCsvBytes(new Uint8Array([0xef, 0xbb, 0xbf, 0x41]))).toMatchObject({ ok: true, text: 'A' });
    expect(decodeCsvBytes(new Uint8Array([0xff, 0xfe, 0x41, 0x00, 0xfc, 0x00]))).toMatchObject({ ok: true, text: 'Aü', encoding: 'utf-16le' });
    expect(decodeCsvBytes(new Uint8Array([0x4b, 0xfc]), 'windows-1252')).toMatchObject({ ok: true, text: 'Kü' });
    expect(decodeCsvBytes(new Uint8Array([0x41]), 'no-such-charset')).toMatchObject({ ok: false, row: 1 });
  });
});
