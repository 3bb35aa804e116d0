/**
 * Reads the parts of an RFC 5322 message the fake shows: headers, and the body of a
 * single-part text message in 7bit, 8bit, quoted-printable (RFC 2045 §6.7) or base64.
 * Enough for what the app sends (plain text, one part); multipart bodies are kept raw.
 */
export type ParsedMessage = { subject: string; from: string; to: string; text: string; links: string[] };

export function parseMessage(raw: string): ParsedMessage {
  const split = raw.search(/\r?\n\r?\n/);
  const headerBlock = split < 0 ? raw : raw.slice(0, split);
  const body = split < 0 ? '' : raw.slice(split).replace(/^\r?\n\r?\n/, '');
  const headers = parseHeaders(headerBlock);
  const text = decodeBody(body, headers['content-transfer-encoding'] ?? '7bit');
  return {
    subject: decodeWords(headers.subject ?? ''),
    from: decodeWords(headers.from ?? ''),
    to: decodeWords(headers.to ?? ''),
    text,
    links: Array.from(new Set(text.match(/https?:\/\/[^\s<>")]+/g) ?? [])),
  };
}

function parseHeaders(block: string): Record<string, string> {
  const unfolded = block.replace(/\r?\n[ \t]+/g, ' ');
  const headers: Record<string, string> = {};
  for (const line of unfolded.split(/\r?\n/)) {
    const colon = line.indexOf(':');
    if (colon > 0) headers[line.slice(0, colon).trim().toLowerCase()] = line.slice(colon + 1).trim();
  }
  return headers;
}

function decodeBody(body: string, encoding: string): string {
  const kind = encoding.toLowerCase();
  if (kind === 'base64') return Buffer.from(body.replace(/\s+/g, ''), 'base64').toString('utf8');
  if (kind === 'quoted-printable') return decodeQuotedPrintable(body);
  return body;
}

export function decodeQuotedPrintable(body: string): string {
  const soft = body.replace(/=\r?\n/g, '');
  const bytes: number[] = [];
  for (let i = 0; i < soft.length; i++) {
    const hex = soft.slice(i + 1, i + 3);
    if (soft[i] === '=' && /^[0-9A-Fa-f]{2}$/.test(hex)) {
      bytes.push(parseInt(hex, 16));
      i += 2;
    } else {
      bytes.push(...Buffer.from(soft[i]!, 'utf8'));
    }
  }
  return Buffer.from(bytes).toString('utf8');
}

/** RFC 2047 encoded words, =?charset?B|Q?text?= (UTF-8 only, which is what nodemailer writes). */
function decodeWords(value: string): string {
  return value
    .replace(/\?=\s+=\?/g, '?==?')
    .replace(/=\?([^?]+)\?([BbQq])\?([^?]*)\?=/g, (_, _charset: string, kind: string, text: string) =>
      kind.toUpperCase() === 'B'
        ? Buffer.from(text, 'base64').toString('utf8')
        : decodeQuotedPrintable(text.replace(/_/g, ' ')),
    );
}
