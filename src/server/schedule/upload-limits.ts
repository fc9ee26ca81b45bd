// Shared by the main thread and the upload worker, so it does not import "server-only" (whose
// default export throws in a plain Node worker); only src/server code imports it.

/**
 * What one import may cost. A real schedule is a few hundred rows of some 25 columns; these
 * leave ample room (a 20,000-row XLSX of 45 columns is about 40 MB of XML) while bounding what a
 * hostile file can make the server do. Every refusal is a 4xx naming the limit.
 */
export const UPLOAD_LIMITS = {
  /** Rows below the heading, per sheet. */
  maxRows: 20_000,
  /** Columns of any row (the heading included); a worksheet's dimension beyond this is refused. */
  maxColumns: 512,
  /** Characters of text kept from the matched cells of one sheet. */
  maxTextChars: 32_000_000,
  /** Sum of the uncompressed sizes an XLSX archive declares, and its number of entries. */
  maxUncompressedBytes: 64 * 1024 * 1024,
  maxZipEntries: 1_000,
  /** The worker thread that reads the file: its V8 heap, and how long it may take. */
  workerHeapMb: 512,
  workerTimeMs: 30_000,
  /** Uploads read at once; more wait in line, and beyond the line are told to retry (503). */
  concurrentReads: 2,
  queuedReads: 8,
} as const;

export type UploadErrorCode = "invalid_input" | "payload_too_large" | "unavailable";

/** A refusal raised while reading a file; the main thread turns it into an AppError. */
export class UploadError extends Error {
  constructor(
    readonly code: UploadErrorCode,
    message: string,
    readonly details?: unknown,
  ) {
    super(message);
    this.name = "UploadError";
  }
}
