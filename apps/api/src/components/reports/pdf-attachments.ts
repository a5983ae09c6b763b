import { createHash } from 'node:crypto';
import { inflateSync } from 'node:zlib';

// Reads the embedded files of a PDF written by pdfkit (ISO 32000-1 §7.11.4):
// each is a stream object of /Type /EmbeddedFile whose dictionary gives its
// /Length and, when compressed, /Filter /FlateDecode; /Params /CheckSum is
// the MD5 of the data. This is not a general PDF parser: a file it cannot
// read simply yields no attachments.

export interface Attachment {
  data: Buffer;
  checksumMatches: boolean | null;
}

export function readAttachments(pdf: Buffer, limit = 8): Attachment[] {
  const text = pdf.toString('latin1');
  const out: Attachment[] = [];
  const re = /\/Type\s*\/EmbeddedFile\b/g;
  for (let m = re.exec(text); m && out.length < limit; m = re.exec(text)) {
    const dictStart = text.lastIndexOf('obj', m.index);
    const streamAt = text.indexOf('stream', m.index);
    if (dictStart < 0 || streamAt < 0) continue;
    const dict = text.slice(dictStart, streamAt);
    const length = /\/Length\s+(\d+)(?!\s+\d+\s+R)/.exec(dict);
    if (!length) continue;
    let start = streamAt + 'stream'.length;
    if (text[start] === '\r') start += 1;
    if (text[start] === '\n') start += 1;
    const raw = pdf.subarray(start, start + Number(length[1]));
    let data: Buffer;
    try {
      data = /\/Filter\s*\/FlateDecode/.test(dict) ? inflateSync(raw) : Buffer.from(raw);
    } catch {
      continue;
    }
    const sum = /\/CheckSum\s*\(([0-9a-fA-F]{32})\)/.exec(dict);
    out.push({ data, checksumMatches: sum ? createHash('md5').update(data).digest('hex') === sum[1]!.toLowerCase() : null });
  }
  return out;
}
