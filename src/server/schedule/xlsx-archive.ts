// Used by the main thread (the declared sizes and dimensions, before a worker starts) and by the
// upload worker (the real sizes), so it does not import "server-only" (it throws in a worker).
import { inflateRawSync, constants as zlib } from "node:zlib";
import { UPLOAD_LIMITS, UploadError } from "./upload-limits";

/**
 * The cheap checks on an XLSX (a zip archive) made before anything inflates it: the sizes its
 * central directory declares (a compression bomb declares gigabytes in a few kilobytes) and the
 * dimension each worksheet states (`A1:XFD20000` is 327 million cells, whatever the file size).
 * Declared sizes can lie; the worker that then reads the file has its memory and time capped, so
 * a lie costs the sender a refusal and nothing else.
 */
export interface ZipEntry {
  name: string;
  method: number;
  compressedSize: number;
  uncompressedSize: number;
  localHeaderOffset: number;
}

const EOCD_SIGNATURE = 0x06054b50;
const CENTRAL_SIGNATURE = 0x02014b50;
const LOCAL_SIGNATURE = 0x04034b50;

const unreadable = (why: string) => new UploadError("invalid_input", "The file is not an XLSX workbook that can be read", [{ row: 0, column: "", field: "file", message: why }]);

/** The entries of a zip's central directory (no data is inflated). */
export function zipEntries(bytes: Uint8Array): ZipEntry[] {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  // The end-of-central-directory record is the last 22 bytes, unless a comment (≤ 65,535 bytes) follows it.
  let eocd = -1;
  for (let i = bytes.byteLength - 22; i >= Math.max(0, bytes.byteLength - 22 - 65_535); i--) {
    if (view.getUint32(i, true) === EOCD_SIGNATURE) {
      eocd = i;
      break;
    }
  }
  if (eocd < 0) throw unreadable("Not a zip archive (no central directory)");
  const count = view.getUint16(eocd + 10, true);
  const size = view.getUint32(eocd + 12, true);
  const offset = view.getUint32(eocd + 16, true);
  if (count === 0xffff || size === 0xffffffff || offset === 0xffffffff) {
    throw new UploadError("payload_too_large", "The workbook is a ZIP64 archive, larger than an import reads", [{ row: 0, column: "", field: "file", message: "ZIP64 archives are not read" }]);
  }
  if (count > UPLOAD_LIMITS.maxZipEntries) {
    throw new UploadError("payload_too_large", `The workbook holds ${count} parts; an import reads at most ${UPLOAD_LIMITS.maxZipEntries}`, [{ row: 0, column: "", field: "file", message: "Too many parts in the archive" }]);
  }
  if (offset + size > bytes.byteLength) throw unreadable("The zip's central directory is cut short");
  const entries: ZipEntry[] = [];
  let p = offset;
  for (let n = 0; n < count; n++) {
    if (p + 46 > bytes.byteLength || view.getUint32(p, true) !== CENTRAL_SIGNATURE) throw unreadable("The zip's central directory is damaged");
    const nameLength = view.getUint16(p + 28, true);
    const extraLength = view.getUint16(p + 30, true);
    const commentLength = view.getUint16(p + 32, true);
    entries.push({
      name: new TextDecoder().decode(bytes.subarray(p + 46, p + 46 + nameLength)),
      method: view.getUint16(p + 10, true),
      compressedSize: view.getUint32(p + 20, true),
      uncompressedSize: view.getUint32(p + 24, true),
      localHeaderOffset: view.getUint32(p + 42, true),
    });
    p += 46 + nameLength + extraLength + commentLength;
  }
  return entries;
}

/** The first bytes of an entry's content, inflated from a bounded slice of its data. */
function entryHead(bytes: Uint8Array, entry: ZipEntry, headBytes: number): string {
  const start = dataStart(bytes, entry);
  const data = bytes.subarray(start, Math.min(start + entry.compressedSize, start + headBytes, bytes.byteLength));
  if (entry.method === 0) return new TextDecoder().decode(data);
  if (entry.method !== 8) throw unreadable(`The part ${entry.name} uses a compression method XLSX files do not use`);
  // A cut-off deflate stream, flushed: whatever those bytes decode to, at most ~1,032× their size.
  const out = inflateRawSync(data, { finishFlush: zlib.Z_SYNC_FLUSH, maxOutputLength: headBytes * 1100 });
  return out.subarray(0, 64 * 1024).toString("utf8");
}

/** "XFD" → 16384 (A = 1). */
function columnNumber(letters: string): number {
  let n = 0;
  for (const ch of letters.toUpperCase()) n = n * 26 + (ch.charCodeAt(0) - 64);
  return n;
}

/**
 * A worksheet's `<dimension ref="A1:XFD20000"/>` as the last column and row it reaches, when it
 * states one early on. The extent counts from A1, not from the range's corner: `XFD1:XFD20000` is
 * one column wide, but a reader indexing cells by column still reaches column 16,384.
 */
export function sheetDimension(head: string): { ref: string; columns: number; rows: number } | null {
  const end = head.indexOf("<sheetData");
  const at = head.indexOf("<dimension");
  if (at < 0 || (end >= 0 && at > end)) return null;
  const ref = /^<dimension\s+ref="([A-Za-z]{1,3})(\d{1,7})(?::([A-Za-z]{1,3})(\d{1,7}))?"/.exec(head.slice(at, at + 80));
  if (!ref) return null;
  const [, c1, r1, c2 = c1!, r2 = r1!] = ref;
  return { ref: ref[0].slice(ref[0].indexOf('"') + 1, -1), columns: Math.max(columnNumber(c1!), columnNumber(c2!)), rows: Math.max(Number(r1), Number(r2)) };
}

/** Where an entry's compressed data starts. */
function dataStart(bytes: Uint8Array, entry: ZipEntry): number {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const at = entry.localHeaderOffset;
  if (at + 30 > bytes.byteLength || view.getUint32(at, true) !== LOCAL_SIGNATURE) throw unreadable(`The part ${entry.name} is damaged`);
  return at + 30 + view.getUint16(at + 26, true) + view.getUint16(at + 28, true);
}

/**
 * Inflates every part with its declared size as a hard ceiling, so a part that unpacks to more
 * than its central directory says (a lying bomb) is refused having produced at most that much.
 * Run in the worker, before the XLSX reader (which would inflate everything, then compare).
 */
export function checkInflatedSizes(bytes: Uint8Array): void {
  for (const entry of zipEntries(bytes)) {
    if (entry.method !== 8) continue;
    const start = dataStart(bytes, entry);
    try {
      inflateRawSync(bytes.subarray(start, start + entry.compressedSize), { maxOutputLength: Math.max(1, entry.uncompressedSize) });
    } catch (error) {
      if ((error as { code?: string }).code !== "ERR_BUFFER_TOO_LARGE") throw unreadable(`The part ${entry.name} cannot be unpacked`);
      throw new UploadError("payload_too_large", `A part of the workbook (${entry.name}) unpacks to more than the ${entry.uncompressedSize} bytes it declares; the file is refused`, [
        { row: 0, column: "", field: "file", message: "Uncompressed size larger than declared" },
      ]);
    }
  }
}

/** Refuses, before any inflating, an archive or a worksheet larger than an import reads. */
export function checkXlsxArchive(bytes: Uint8Array): void {
  const entries = zipEntries(bytes);
  const declared = entries.reduce((sum, e) => sum + e.uncompressedSize, 0);
  if (declared > UPLOAD_LIMITS.maxUncompressedBytes) {
    const mb = (n: number) => `${Math.round(n / 1024 / 1024).toLocaleString("en")} MB`;
    throw new UploadError("payload_too_large", `The workbook unpacks to ${mb(declared)}; an import reads at most ${mb(UPLOAD_LIMITS.maxUncompressedBytes)} unpacked`, [
      { row: 0, column: "", field: "file", message: `Declared uncompressed size ${declared} bytes` },
    ]);
  }
  for (const entry of entries) {
    if (!/^xl\/worksheets\/[^/]+\.xml$/.test(entry.name)) continue;
    const dim = sheetDimension(entryHead(bytes, entry, 4096));
    if (!dim) continue;
    if (dim.columns > UPLOAD_LIMITS.maxColumns || dim.rows > UPLOAD_LIMITS.maxRows + 1) {
      throw new UploadError("payload_too_large", `A worksheet spans ${dim.ref}, reaching column ${dim.columns.toLocaleString("en")} and row ${dim.rows.toLocaleString("en")}; an import reads at most ${UPLOAD_LIMITS.maxColumns} columns and ${UPLOAD_LIMITS.maxRows.toLocaleString("en")} rows below the heading — delete the cells beyond them`, [
        { row: 0, column: "", field: "file", message: `Worksheet dimension ${dim.ref} (${entry.name})` },
      ]);
    }
  }
}
