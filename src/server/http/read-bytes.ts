import "server-only";
import { AppError } from "./app-error";

// Past its limit, a body is still read (and discarded, never kept) up to this many bytes in the
// background, so a client that is still sending receives the 413 instead of a broken pipe.
// Beyond it the stream is cancelled and the connection may be cut.
const DRAIN_CAP_BYTES = 64 * 1024 * 1024;

async function drain(reader: ReadableStreamDefaultReader<Uint8Array>, seen: number): Promise<void> {
  try {
    let size = seen;
    while (size <= DRAIN_CAP_BYTES) {
      const { done, value } = await reader.read();
      if (done) return;
      size += value.byteLength;
    }
    await reader.cancel();
  } catch {
    // The client went away: nothing left to drain.
  }
}

/**
 * A request's body, read through a counter: the bytes are counted as they stream in (a chunked
 * body has no content-length, and a content-length may lie), and the moment the count passes
 * `maxBytes` the request is refused with 413 without keeping anything more. Every body the app
 * reads goes through here (JSON bodies in route(), uploads, the Stripe webhook, Auth.js posts).
 */
export async function readCappedBody(req: Request, maxBytes: number, what = "Body"): Promise<Uint8Array> {
  const tooLarge = () => new AppError("payload_too_large", `${what} larger than ${maxBytes} bytes`);
  if (Number(req.headers.get("content-length") ?? 0) > Math.max(maxBytes, DRAIN_CAP_BYTES)) throw tooLarge();
  const reader = req.body?.getReader();
  if (!reader) return new Uint8Array(0);
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      void drain(reader, size);
      throw tooLarge();
    }
    chunks.push(value);
  }
  return chunks.length === 1 ? chunks[0]! : new Uint8Array(Buffer.concat(chunks));
}

/** A request's raw body (an uploaded file), refused with 413 beyond `maxBytes`. */
export async function readBytes(req: Request, maxBytes: number): Promise<Uint8Array> {
  const buf = await readCappedBody(req, maxBytes, "File");
  if (buf.byteLength === 0) throw new AppError("invalid_input", "The upload is empty", [{ field: "file", message: "Send the file as the request body" }]);
  return buf;
}
