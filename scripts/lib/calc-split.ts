// Cutting a large command-line body `{"cases":[…]}` in two at a comma between cases, so that two
// threads each parse and compute one half (scripts/calc.ts, scripts/calc-worker.ts). Only the
// plain shape is cut — the one key "cases", its array closing just before the object's end —
// and only where a byte scan, aware of strings and their escapes, finds a comma at the array's
// own depth. Anything else is left whole (null) for the one-thread path, which gives the
// endpoint's verdict on it. The halves are then parsed separately; both must parse to non-empty
// arrays (a stray comma would otherwise slip through), or the caller falls back to parsing the
// whole. When both do, the whole text is `{"cases":[` A `,` B `]}` with A and B lists of values:
// the cases of the whole are those of A followed by those of B.

import { isAscii } from "node:buffer";

/** Byte ranges [start, end) of the two halves' cases, without the brackets and the joining comma. */
export interface CaseSplit {
  headStart: number;
  headEnd: number;
  tailStart: number;
  tailEnd: number;
}

const QUOTE = 0x22;
const BACKSLASH = 0x5c;
const COMMA = 0x2c;
const OPEN_BRACE = 0x7b;
const CLOSE_BRACE = 0x7d;
const OPEN_BRACKET = 0x5b;
const CLOSE_BRACKET = 0x5d;
const KEY = [QUOTE, 0x63, 0x61, 0x73, 0x65, 0x73, QUOTE]; // "cases"

/** JSON's whitespace: space, tab, line feed, carriage return. */
const isSpace = (c: number) => c === 0x20 || c === 0x0a || c === 0x0d || c === 0x09;

function skipSpace(b: Uint8Array, i: number): number {
  while (i < b.length && isSpace(b[i]!)) i++;
  return i;
}

/**
 * Where `{"cases":[…]}` in UTF-8 bytes can be cut: at the first comma between cases at or after
 * `share` of the array's length, else the last one before it (no byte of a multi-byte UTF-8 character is ASCII, so the scan
 * reads bytes). Null when the body is of another shape or no such comma exists.
 */
export function splitCases(b: Uint8Array, share = 0.5): CaseSplit | null {
  let i = skipSpace(b, 0);
  if (b[i] !== OPEN_BRACE) return null;
  i = skipSpace(b, i + 1);
  for (const k of KEY) if (b[i++] !== k) return null;
  i = skipSpace(b, i);
  if (b[i] !== 0x3a) return null; // ":"
  i = skipSpace(b, i + 1);
  if (b[i] !== OPEN_BRACKET) return null;
  const headStart = i + 1;
  let j = b.length - 1;
  while (j >= 0 && isSpace(b[j]!)) j--;
  if (b[j] !== CLOSE_BRACE) return null;
  j--;
  while (j >= 0 && isSpace(b[j]!)) j--;
  if (b[j] !== CLOSE_BRACKET || j < headStart) return null;
  const tailEnd = j;
  const mid = headStart + Math.floor((tailEnd - headStart) * share);
  let depth = 0;
  let last = -1;
  for (let k = headStart; k < tailEnd; k++) {
    const c = b[k]!;
    if (c === QUOTE) {
      // Skip the string: a backslash escapes the byte after it.
      for (k++; k < tailEnd; k++) {
        const d = b[k]!;
        if (d === BACKSLASH) k++;
        else if (d === QUOTE) break;
      }
    } else if (c === OPEN_BRACE || c === OPEN_BRACKET) {
      depth++;
    } else if (c === CLOSE_BRACE || c === CLOSE_BRACKET) {
      if (--depth < 0) return null;
    } else if (c === COMMA && depth === 0) {
      if (k >= mid) return { headStart, headEnd: k, tailStart: k + 1, tailEnd };
      last = k;
    }
  }
  // No comma past the share: the last one before it, if any.
  return depth === 0 && last >= 0 ? { headStart, headEnd: last, tailStart: last + 1, tailEnd } : null;
}

/** UTF-8 text of the bytes; pure ASCII (the usual body) decodes faster as Latin-1, to the same string. */
export function decodeText(bytes: Buffer): string {
  return isAscii(bytes) ? bytes.toString("latin1") : bytes.toString("utf8");
}
