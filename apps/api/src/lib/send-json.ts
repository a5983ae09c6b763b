import { createHash } from 'node:crypto';

import type { Response } from 'express';

// Serialised bodies of long-lived response objects (cached by a use case),
// with their ETag: a hot read answers without stringifying, converting and
// hashing the same tens of kilobytes again. Keyed weakly, so a body goes when
// its object leaves the use case's cache.
const bodies = new WeakMap<object, { body: Buffer; etag: string }>();

/** res.json for an object that is returned again and again unchanged (a conditional GET gets 304). */
export function sendJson(res: Response, value: object): void {
  let entry = bodies.get(value);
  if (!entry) {
    const body = Buffer.from(JSON.stringify(value));
    entry = { body, etag: `W/"${body.length.toString(16)}-${createHash('sha1').update(body).digest('base64').slice(0, 27)}"` };
    bodies.set(value, entry);
  }
  // With the ETag set, express's send uses it (no hashing) and answers a fresh conditional GET with 304.
  res.setHeader('ETag', entry.etag);
  res.type('application/json');
  res.send(entry.body);
}
