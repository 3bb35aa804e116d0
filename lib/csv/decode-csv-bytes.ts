import Papa from 'papaparse';

export type DecodedCsv = { ok: true; text: string; encoding: string } | { ok: false; row: number; message: string };

const BOMS: Array<{ bytes: number[]; encoding: string }> = [
  { bytes: [0xef, 0xbb, 0xbf], encoding: 'utf-8' },
  { bytes: [0xff, 0xfe], encoding: 'utf-16le' },
  { bytes: [0xfe, 0xff], encoding: 'utf-16be' },
];

/**
 * The text of an uploaded CSV. A byte-order mark or a declared charset (the upload's
 * `charset=` parameter) chooses the encoding; otherwise the file must be valid UTF-8, and
 * one that is not is refused naming the row and the byte instead of being read with U+FFFD
 * in place of its letters (the WHATWG Encoding Standard's "fatal" decoder decides validity).
 */
export function decodeCsvBytes(bytes: Uint8Array, declaredCharset?: string | null): DecodedCsv {
  const bom = BOMS.find((b) => b.bytes.every((byte, i) => bytes[i] === byte));
  if (bom) return decodeWith(bom.encoding, bytes.subarray(bom.bytes.length));
  const declared = declaredCharset?.trim().toLowerCase();
  if (declared && declared !== 'utf-8' && declared !== 'utf8') return decodeWith(declared, bytes);
  try {
    return { ok: true, text: new TextDecoder('utf-8', { fatal: true }).decode(bytes), encoding: 'utf-8' };
  } catch {
    return notUtf8(bytes);
  }
}

function decodeWith(encoding: string, bytes: Uint8Array): DecodedCsv {
  let decoder: TextDecoder;
  try {
    decoder = new TextDecoder(encoding, { fatal: true });
  } catch {
    return { ok: false, row: 1, message: `The file's declared encoding "${encoding}" is not one this import knows; save it as CSV UTF-8` };
  }
  try {
    return { ok: true, text: decoder.decode(bytes), encoding: decoder.encoding };
  } catch {
    return { ok: false, row: 1, message: `The file is not valid ${decoder.encoding} text as it declares; save it as CSV UTF-8` };
  }
}

function notUtf8(bytes: Uint8Array): DecodedCsv {
  const offset = firstInvalidUtf8Offset(bytes);
  const prefix = new TextDecoder('utf-8').decode(bytes.subarray(0, offset));
  // The bad byte lies in the last (possibly partial) row of the valid text before it; the header is row 1.
  const row = Math.max(1, Papa.parse(prefix).data.length);
  const byte = bytes[offset] ?? 0;
  return {
    ok: false,
    row,
    message:
      `The file is not UTF-8 text: row ${row} has the byte 0x${byte.toString(16).toUpperCase().padStart(2, '0')} (position ${offset + 1}), ` +
      'which is not valid UTF-8 (a Latin-1 or Windows-1252 file looks like this). Save it as “CSV UTF-8” in the spreadsheet program, ' +
      'or send it with its charset (text/csv; charset=windows-1252). Nothing was imported.',
  };
}

/** Where the first byte sequence that is not UTF-8 starts (RFC 3629 §4), or the length when there is none. */
function firstInvalidUtf8Offset(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const length = sequenceLength(bytes, i);
    if (length === 0) return i;
    i += length;
  }
  return bytes.length;
}

function sequenceLength(bytes: Uint8Array, i: number): number {
  const lead = bytes[i]!;
  if (lead < 0x80) return 1;
  const [count, low, high] =
    lead >= 0xc2 && lead <= 0xdf ? [1, 0x80, 0xbf]
    : lead === 0xe0 ? [2, 0xa0, 0xbf]
    : lead === 0xed ? [2, 0x80, 0x9f]
    : lead >= 0xe1 && lead <= 0xef ? [2, 0x80, 0xbf]
    : lead === 0xf0 ? [3, 0x90, 0xbf]
    : lead >= 0xf1 && lead <= 0xf3 ? [3, 0x80, 0xbf]
    : lead === 0xf4 ? [3, 0x80, 0x8f]
    : [0, 0, 0];
  if (count === 0) return 0;
  const second = bytes[i + 1];
  if (second === undefined || second < low || second > high) return 0;
  for (let k = 2; k <= count; k++) {
    const next = bytes[i + k];
    if (next === undefined || next < 0x80 || next > 0xbf) return 0;
  }
  return count + 1;
}
