import "server-only";
import { AppError } from "./app-error";

/** A request's raw body (an uploaded file), refused with 413 beyond `maxBytes`. */
export async function readBytes(req: Request, maxBytes: number): Promise<Uint8Array> {
  if (Number(req.headers.get("content-length") ?? 0) > maxBytes) throw new AppError("payload_too_large", `File larger than ${maxBytes} bytes`);
  const buf = new Uint8Array(await req.arrayBuffer());
  if (buf.byteLength > maxBytes) throw new AppError("payload_too_large", `File larger than ${maxBytes} bytes`);
  if (buf.byteLength === 0) throw new AppError("invalid_input", "The upload is empty", [{ field: "file", message: "Send the file as the request body" }]);
  return buf;
}
