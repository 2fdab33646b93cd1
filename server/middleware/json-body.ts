import express, { type RequestHandler } from 'express';

export const MAX_JSON_DEPTH = 64;

const OPEN = new Set([0x5b, 0x7b]);
const CLOSE = new Set([0x5d, 0x7d]);
const QUOTE = 0x22;
const BACKSLASH = 0x5c;

// Counted on the raw bytes, before JSON.parse and zod ever recurse into it. UTF-8 never puts an
// ASCII byte inside a multi-byte character, so brackets and quotes can be read byte by byte.
export function jsonDepth(buf: Uint8Array, stopAbove = Infinity): number {
  let depth = 0;
  let deepest = 0;
  let inString = false;
  for (let i = 0; i < buf.length; i += 1) {
    const b = buf[i];
    if (inString) {
      if (b === BACKSLASH) i += 1;
      else if (b === QUOTE) inString = false;
    } else if (b === QUOTE) inString = true;
    else if (OPEN.has(b)) {
      depth += 1;
      if (depth > deepest) deepest = depth;
      if (deepest > stopAbove) return deepest;
    } else if (CLOSE.has(b)) depth -= 1;
  }
  return deepest;
}

class TooDeep extends Error {
  readonly status = 400;
  readonly type = 'entity.too.deep';
}

export function jsonBody(opts: { limit: string }): RequestHandler {
  return express.json({
    limit: opts.limit,
    verify: (_req, _res, buf) => {
      if (jsonDepth(buf, MAX_JSON_DEPTH) > MAX_JSON_DEPTH) throw new TooDeep(`nested deeper than ${MAX_JSON_DEPTH} levels`);
    },
  });
}
