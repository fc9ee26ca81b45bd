import "server-only";
import { z, type ZodType } from "zod";
import { AppError } from "./app-error";

type Params = Record<string, string | string[] | undefined>;

export interface RouteOptions<TBody, TQuery, TParams> {
  /** Schema of the JSON body; without one, the body is not read. */
  body?: ZodType<TBody>;
  /** Schema of the query string, given as an object of strings (repeated keys become arrays). */
  query?: ZodType<TQuery>;
  /** Schema of the dynamic route segments. */
  params?: ZodType<TParams>;
  /** Status for input that fails its schema: 422 (default) or 400 where a contract says so. */
  invalidStatus?: 400 | 422;
  /** Largest accepted body in bytes (413 above it). Default 1 MB. */
  maxBodyBytes?: number;
}

export interface RouteContext<TBody, TQuery, TParams> {
  req: Request;
  body: TBody;
  query: TQuery;
  params: TParams;
}

type Handler<TBody, TQuery, TParams> = (ctx: RouteContext<TBody, TQuery, TParams>) => Promise<Response | unknown> | Response | unknown;

/** `{ error: { code, message, details? } }` with the status the code maps to. */
export function errorResponse(error: AppError, status = error.status): Response {
  const body = { error: { code: error.code, message: error.message, ...(error.details === undefined ? {} : { details: error.details }) } };
  return Response.json(body, { status, headers: { "cache-control": "no-store" } });
}

function invalid(error: z.ZodError, where: string, status: 400 | 422): Response {
  const details = error.issues.map((i) => ({ field: [where, ...i.path].join("."), message: i.message }));
  return errorResponse(new AppError(status === 400 ? "bad_request" : "invalid_input", `Invalid ${where}`, details), status);
}

// Bodies over the limit are still read (and discarded) up to this many bytes, so the client can
// finish sending and receives the 413 instead of a broken pipe. Beyond it the connection is cut.
const DRAIN_CAP_BYTES = 64 * 1024 * 1024;

async function readJson(req: Request, maxBytes: number): Promise<unknown> {
  const tooLarge = () => new AppError("payload_too_large", `Body larger than ${maxBytes} bytes`);
  if (Number(req.headers.get("content-length") ?? 0) > Math.max(maxBytes, DRAIN_CAP_BYTES)) throw tooLarge();
  const chunks: Uint8Array[] = [];
  let size = 0;
  const reader = req.body?.getReader();
  while (reader) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > DRAIN_CAP_BYTES) {
      await reader.cancel();
      break;
    }
    if (size <= maxBytes) chunks.push(value);
  }
  if (size > maxBytes) throw tooLarge();
  try {
    return JSON.parse(Buffer.concat(chunks).toString("utf8"));
  } catch {
    throw new AppError("bad_request", "Body is not valid JSON");
  }
}

function queryObject(req: Request): Record<string, string | string[]> {
  const out: Record<string, string | string[]> = {};
  for (const [key, value] of new URL(req.url).searchParams) {
    const prev = out[key];
    out[key] = prev === undefined ? value : Array.isArray(prev) ? [...prev, value] : [prev, value];
  }
  return out;
}

/**
 * The one wrapper every route handler goes through: it parses and validates input with zod and
 * maps errors to HTTP statuses in one place. Auth, role checks and firm scoping join here when
 * sign-in lands, so handlers stay a few lines long.
 *
 * @example export const GET = route({ params: ZProjectParams }, async ({ params }) => getProjectOrThrow(params.projectId));
 */
export function route<TBody = undefined, TQuery = Record<string, string | string[]>, TParams = Params>(
  options: RouteOptions<TBody, TQuery, TParams>,
  handler: Handler<TBody, TQuery, TParams>,
): (req: Request, ctx?: { params?: Promise<Params> }) => Promise<Response> {
  const invalidStatus = options.invalidStatus ?? 422;
  return async (req, ctx) => {
    try {
      const rawParams = (await ctx?.params) ?? {};
      const params = options.params ? options.params.safeParse(rawParams) : { success: true as const, data: rawParams as TParams };
      if (!params.success) return invalid(params.error, "params", invalidStatus);
      const query = options.query ? options.query.safeParse(queryObject(req)) : { success: true as const, data: queryObject(req) as TQuery };
      if (!query.success) return invalid(query.error, "query", invalidStatus);
      let body = undefined as TBody;
      if (options.body) {
        const parsed = options.body.safeParse(await readJson(req, options.maxBodyBytes ?? 1_000_000));
        if (!parsed.success) return invalid(parsed.error, "body", invalidStatus);
        body = parsed.data;
      }
      const result = await handler({ req, body, query: query.data, params: params.data });
      return result instanceof Response ? result : Response.json(result ?? null);
    } catch (error) {
      if (error instanceof AppError) return errorResponse(error);
      if (error instanceof z.ZodError) return invalid(error, "input", invalidStatus);
      console.error(`${req.method} ${new URL(req.url).pathname} failed:`, error);
      return errorResponse(new AppError("internal", "Something went wrong on our side"));
    }
  };
}
