/**
 * Reads the parts of an RFC 5322 message the fake shows: headers, the text, and the
 * attachments of a MIME multipart message (RFC 2046 §5.1: parts between `--boundary` lines),
 * each body in 7bit, 8bit, quoted-printable (RFC 2045 §6.7) or base64.
 */
export type MessageAttachment = { filename: string; contentType: string; size: number };
export type ParsedMessage = { subject: string; from: string; to: string; text: string; links: string[]; attachments: MessageAttachment[] };
export type ParsedMessageWithContent = ParsedMessage & { attachmentContents: Buffer[] };

type Part = { headers: Record<string, string>; body: string };

function splitPart(raw: string): Part {
  const split = raw.search(/\r?\n\r?\n/);
  const headerBlock = split < 0 ? raw : raw.slice(0, split);
  const body = split < 0 ? '' : raw.slice(split).replace(/^\r?\n\r?\n/, '');
  return { headers: parseHeaders(headerBlock), body };
}

/** A header parameter such as boundary="x" or filename=report.pdf (RFC 2045 §5.1), unquoted. */
function headerParameter(header: string | undefined, name: string): string | null {
  const match = new RegExp(`;\\s*${name}\\*?=("([^"]*)"|[^;\\s]+)`, 'i').exec(header ?? '');
  return match ? (match[2] ?? match[1]!) : null;
}

/** The leaf parts of a (possibly nested) multipart body, in order. */
function leafParts(part: Part): Part[] {
  const type = part.headers['content-type'] ?? 'text/plain';
  const boundary = /^multipart\//i.test(type) ? headerParameter(type, 'boundary') : null;
  if (!boundary) return [part];
  const pieces = part.body.split(new RegExp(`\\r?\\n?--${boundary.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}(?:--)?[ \\t]*\\r?\\n?`));
  return pieces
    .slice(1, -1)
    .filter((piece) => piece.trim() !== '')
    .flatMap((piece) => leafParts(splitPart(piece)));
}

function bodyBytes(part: Part): Buffer {
  const kind = (part.headers['content-transfer-encoding'] ?? '7bit').toLowerCase();
  if (kind === 'base64') return Buffer.from(part.body.replace(/\s+/g, ''), 'base64');
  if (kind === 'quoted-printable') return Buffer.from(decodeQuotedPrintable(part.body), 'utf8');
  return Buffer.from(part.body, 'utf8');
}

export function parseMessage(raw: string): ParsedMessageWithContent {
  const message = splitPart(raw);
  const parts = leafParts(message);
  const isAttachment = (p: Part) =>
    /^attachment/i.test(p.headers['content-disposition'] ?? '') || headerParameter(p.headers['content-disposition'], 'filename') !== null;
  const textPart = parts.find((p) => !isAttachment(p) && /^text\/plain/i.test(p.headers['content-type'] ?? 'text/plain'));
  const text = textPart ? decodeBody(textPart.body, textPart.headers['content-transfer-encoding'] ?? '7bit') : '';
  const files = parts.filter(isAttachment);
  const attachmentContents = files.map(bodyBytes);
  const { headers } = message;
  return {
    subject: decodeWords(headers.subject ?? ''),
    from: decodeWords(headers.from ?? ''),
    to: decodeWords(headers.to ?? ''),
    text,
    links: Array.from(new Set(text.match(/https?:\/\/[^\s<>")]+/g) ?? [])),
    attachments: files.map((p, i) => ({
      filename: decodeWords(headerParameter(p.headers['content-disposition'], 'filename') ?? headerParameter(p.headers['content-type'], 'name') ?? ''),
      contentType: (p.headers['content-type'] ?? 'application/octet-stream').split(';')[0]!.trim().toLowerCase(),
      size: attachmentContents[i]!.length,
    })),
    attachmentContents,
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
