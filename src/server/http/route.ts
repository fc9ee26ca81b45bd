import "server-only";
import { z, type ZodType } from "zod";
import type { TRole } from "@/schemas/roles";
import type { Actor } from "@/server/auth/actor";
import { requireActor, type AuthMode } from "@/server/auth/require-actor";
import { assertSameOrigin } from "@/server/auth/same-origin";
import { afterLostConnection, isConnectionError } from "@/server/db/connection-error";
import { withWriteLedger } from "@/server/db/write-ledger";
import { AppError } from "./app-error";
import { readCappedBody } from "./read-bytes";
import { internalMessage, logInternalError, requestIdOf } from "./internal-error";

type Params = Record<string, string | string[] | undefined>;

export interface RouteOptions<TBody, TQuery, TParams, TAuth extends AuthMode = "required"> {
  /**
   * "required" (default): a session or an API token, else 401. "optional": the handler gets the
   * actor or null. "public": nobody is resolved (health, sign-up, Auth.js itself).
   */
  auth?: TAuth;
  /** Any one of these roles lets the request through (403 otherwise); omitted: any member. */
  roles?: readonly TRole[];
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
  /**
   * A write whose connection went while its COMMIT was in flight, and which PostgreSQL then says
   * committed, is answered by this (the saved state, read afresh) instead of 503. Without it the
   * request is refused as uncertain.
   */
  ifCommitted?: Handler<TBody, TQuery, TParams, TAuth>;
}

export interface RouteContext<TBody, TQuery, TParams, TAuth extends AuthMode = "required"> {
  req: Request;
  /** Who is acting, for which firm; scope every query by actor.firm.id. */
  actor: TAuth extends "required" ? Actor : Actor | null;
  body: TBody;
  query: TQuery;
  params: TParams;
}

type Handler<TBody, TQuery, TParams, TAuth extends AuthMode> = (ctx: RouteContext<TBody, TQuery, TParams, TAuth>) => Promise<Response | unknown> | Response | unknown;

/** `{ error: { code, message, details? } }` with the status the code maps to. */
export function errorResponse(error: AppError, status = error.status): Response {
  const body = { error: { code: error.code, message: error.message, ...(error.details === undefined ? {} : { details: error.details }) } };
  return Response.json(body, { status, headers: { "cache-control": "no-store" } });
}

function invalid(error: z.ZodError, where: string, status: 400 | 422): Response {
  const details = error.issues.map((i) => ({ field: [where, ...i.path].join("."), message: i.message }));
  return errorResponse(new AppError(status === 400 ? "bad_request" : "invalid_input", `Invalid ${where}`, details), status);
}

async function readJson(req: Request, maxBytes: number): Promise<unknown> {
  const bytes = await readCappedBody(req, maxBytes);
  try {
    return JSON.parse(Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).toString("utf8"));
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
 * The one wrapper every route handler goes through. In order: refuses cross-site state changes
 * (unless token-authenticated), resolves the session or API token, the current firm and roles,
 * checks the required role, parses input with zod, runs the handler and maps every error to its
 * HTTP status in one place — so handlers stay a few lines long.
 *
 * @example export const GET = route({ params: ZProjectParams }, ({ actor, params }) => getProjectOrThrow(actor, params.projectId));
 */
export function route<TBody = undefined, TQuery = Record<string, string | string[]>, TParams = Params, TAuth extends AuthMode = "required">(
  options: RouteOptions<TBody, TQuery, TParams, TAuth>,
  handler: Handler<TBody, TQuery, TParams, TAuth>,
): (req: Request, ctx?: { params?: Promise<Params> }) => Promise<Response> {
  const invalidStatus = options.invalidStatus ?? 422;
  const mode: AuthMode = options.auth ?? "required";
  type Ctx = RouteContext<TBody, TQuery, TParams, TAuth>;
  const attempt = async (req: Request, ctx?: { params?: Promise<Params> }, run: Handler<TBody, TQuery, TParams, TAuth> = handler): Promise<Response> => {
    try {
      // A bearer token is never sent by a browser on its own, so it needs no Origin check.
      if (mode === "public" || !req.headers.has("authorization")) assertSameOrigin(req);
      const actor = await requireActor(req.headers, mode, options.roles);
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
      const result = await run({ req, actor: actor as Ctx["actor"], body, query: query.data, params: params.data });
      return result instanceof Response ? result : Response.json(result ?? null);
    } catch (error) {
      if (error instanceof AppError) return errorResponse(error);
      if (error instanceof z.ZodError) return invalid(error, "input", invalidStatus);
      // Handled by the caller below: a read is tried once more, anything else is refused (503).
      if (isConnectionError(error)) throw new LostConnection(error);
      // Stripe (or its stand-in) not answering is an outage of theirs, not a fault of ours.
      if ((error as { type?: unknown } | null)?.type === "StripeConnectionError") {
        return errorResponse(new AppError("unavailable", "Stripe, which takes our payments, cannot be reached just now. Nothing was changed; try again in a few minutes."));
      }
      // The details go to the log under the request's id; the answer carries the id only.
      const id = logInternalError(`${req.method} ${new URL(req.url).pathname}`, error, requestIdOf(req.headers));
      const res = errorResponse(new AppError("internal", internalMessage(id), { requestId: id }));
      res.headers.set("x-request-id", id);
      return res;
    }
  };
  return async (req, ctx) => {
    const safe = SAFE_METHODS.has(req.method);
    // A write is tried again only when it cannot have changed anything; keep its body for that.
    const spare = safe ? undefined : req.clone();
    const { ledger, outcome } = await withWriteLedger(() => attempt(req, ctx));
    if (outcome.status === "fulfilled") return outcome.value;
    const first = outcome.reason;
    if (!(first instanceof LostConnection)) throw first;
    // A request that lost its database connection (PostgreSQL restarting, a failover) is run once
    // more when the database answers again if it cannot have changed anything: a read, a write
    // that could not connect at all, or a write whose transaction never sent its COMMIT (the
    // server rolls back a transaction whose connection goes). A write whose COMMIT was sent, or
    // that wrote outside a transaction, may have been saved: it is refused (503), never repeated.
    // (A statement that could not connect at all says nothing of the ones before it: a request
    // that committed and then failed to connect for a later statement is decisive all the same.)
    // When its one transaction noted its id, PostgreSQL is asked what became of it: rolled back,
    // the write is run again; committed, a route with `ifCommitted` answers with the saved state.
    const next = await afterLostConnection(ledger, safe, RETRY_WAIT_MS);
    try {
      if (next === "repeat") return await attempt(safe ? req : spare!, ctx);
      // The spare copy of the body is unused here: the answer reads the saved state afresh.
      if (next === "committed" && options.ifCommitted && spare) {
        console.warn(`${req.method} ${new URL(req.url).pathname}: database connection lost while committing; PostgreSQL says it committed, answered with the saved state`);
        return await attempt(spare, ctx, options.ifCommitted);
      }
    } catch (second) {
      if (!(second instanceof LostConnection)) throw second;
    }
    console.warn(`${req.method} ${new URL(req.url).pathname}: database connection lost (${first.cause instanceof Error ? first.cause.message : String(first.cause)})`);
    return errorResponse(new AppError("unavailable", "The database could not be reached just now. Try again in a moment."), 503);
  };
}

const SAFE_METHODS = new Set(["GET", "HEAD"]);
// Long enough for a fast restart of PostgreSQL (about 1–3 s here), short of a client's patience.
const RETRY_WAIT_MS = 8000;

class LostConnection extends Error {
  constructor(readonly cause: unknown) {
    super("database connection lost");
  }
}
