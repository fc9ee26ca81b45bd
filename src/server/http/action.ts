import "server-only";
import { unstable_rethrow } from "next/navigation";
import { z, type ZodType } from "zod";
import type { TRole } from "@/schemas/roles";
import type { Actor } from "@/server/auth/actor";
import { requireActor, type AuthMode } from "@/server/auth/require-actor";
import { afterLostConnection, isConnectionError } from "@/server/db/connection-error";
import { withWriteLedger } from "@/server/db/write-ledger";
import { internalMessage, logInternalError } from "./internal-error";
import { AppError, type AppErrorCode } from "./app-error";

/** What a form gets back from a server action: a result, or an error naming the fields. */
export type ActionState =
  | { ok: true; message?: string; data?: Record<string, unknown> }
  | { ok: false; code: AppErrorCode; message: string; fields?: Record<string, string>; values?: Record<string, string> }
  | null;

interface ActionOptions<TInput, TAuth extends AuthMode> {
  input?: ZodType<TInput>;
  auth?: TAuth;
  roles?: readonly TRole[];
}
type ActionContext<TInput, TAuth extends AuthMode> = { actor: TAuth extends "required" ? Actor : Actor | null; input: TInput };

/**
 * Form fields as an object: `name[]` fields become arrays under `name`, empty strings become
 * undefined (an empty optional field), Next's own `$ACTION…` fields are left out.
 */
export function formObject(form: FormData): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of form) {
    if (key.startsWith("$ACTION") || typeof value !== "string") continue;
    if (key.endsWith("[]")) {
      const name = key.slice(0, -2);
      out[name] = [...((out[name] as string[] | undefined) ?? []), value];
    } else if (value !== "") {
      out[key] = value;
    }
  }
  return out;
}

/** What was typed, to refill the form after an error; passwords are never sent back. */
function echo(raw: Record<string, unknown>): Record<string, string> {
  return Object.fromEntries(Object.entries(raw).filter(([k, v]) => typeof v === "string" && !/password/i.test(k)) as [string, string][]);
}

function fieldErrors(issues: { path: PropertyKey[]; message: string }[]): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const i of issues) fields[i.path.map(String).join(".") || "form"] ??= i.message;
  return fields;
}

/**
 * The server-action twin of route(): the same session, firm and role checks (requireActor), zod
 * parsing of the submitted form, and one mapping of errors — here to a state the form shows next
 * to its fields instead of an HTTP status. Next.js itself refuses cross-site action posts.
 */
export function action<TInput = Record<string, unknown>, TAuth extends AuthMode = "required">(
  options: ActionOptions<TInput, TAuth>,
  handler: (ctx: ActionContext<TInput, TAuth>) => Promise<ActionState | void>,
): (prev: ActionState, form: FormData) => Promise<ActionState> {
  return async (_prev, form) => {
    let raw: Record<string, unknown> = {};
    const failed = (state: Exclude<ActionState, null | { ok: true }>): ActionState => ({ ...state, values: echo(raw) });
    try {
      // A form without useActionState calls the action with the FormData alone.
      if (!(form instanceof FormData)) form = _prev instanceof FormData ? _prev : new FormData();
      const actor = await requireActor(null, options.auth ?? "required", options.roles);
      raw = formObject(form);
      let input = raw as TInput;
      if (options.input) {
        const parsed = options.input.safeParse(raw);
        if (!parsed.success) return failed({ ok: false, code: "invalid_input", message: "Check the highlighted fields", fields: fieldErrors(parsed.error.issues) });
        input = parsed.data;
      }
      const result = (await runOnceMore(() => handler({ actor: actor as ActionContext<TInput, TAuth>["actor"], input }))) ?? { ok: true };
      return result && !result.ok ? failed(result) : result;
    } catch (error) {
      unstable_rethrow(error); // redirect() and notFound() are control flow, not failures
      if (error instanceof AppError) {
        const details = Array.isArray(error.details) ? (error.details as { field?: string; message: string }[]) : [];
        const fields = Object.fromEntries(details.filter((d) => d.field).map((d) => [d.field!, d.message]));
        return failed({ ok: false, code: error.code, message: error.message, ...(details.length ? { fields } : {}) });
      }
      if (error instanceof z.ZodError) return failed({ ok: false, code: "invalid_input", message: "Check the highlighted fields", fields: fieldErrors(error.issues) });
      if (error instanceof UncertainWrite && error.saved) {
        return failed({ ok: false, code: "unavailable", message: "The change was saved, but the database connection was lost before this page heard so. Reload the page to see it." });
      }
      if (error instanceof UncertainWrite) {
        return failed({ ok: false, code: "unavailable", message: "The database connection was lost while saving. Reload the page to see whether the change was saved before trying again." });
      }
      if (isConnectionError(error)) return failed({ ok: false, code: "unavailable", message: "The database could not be reached just now; nothing was saved. Try again in a moment." });
      const id = logInternalError("Server action", error);
      return failed({ ok: false, code: "internal", message: internalMessage(id, "; nothing was saved") });
    }
  };
}

/** A write whose connection was lost after it was sent: `saved` when PostgreSQL says it committed. */
class UncertainWrite extends Error {
  constructor(readonly saved: boolean, options: ErrorOptions) {
    super("database connection lost after a write was sent", options);
  }
}

/**
 * Runs an action's work; when its database connection is lost (PostgreSQL restarting, a
 * failover) and it cannot have changed anything — no COMMIT sent, nothing written outside a
 * transaction (see write-ledger.ts) — runs it once more when the database answers again. One
 * that may have saved is reported as uncertain, never repeated.
 */
async function runOnceMore<T>(work: () => Promise<T>): Promise<T> {
  const { ledger, outcome } = await withWriteLedger(work);
  if (outcome.status === "fulfilled") return outcome.value;
  const error = outcome.reason;
  if (!isConnectionError(error)) throw error;
  // Whatever the error, once a COMMIT (or a write outside a transaction) was sent the work may
  // have saved: a later statement that cannot connect at all does not make it safe to repeat.
  // When its one transaction noted its id, PostgreSQL says whether it committed: rolled back, the
  // work is run again; committed, the user is told it was saved.
  const next = await afterLostConnection(ledger, false, 8000);
  if (next === "down") throw error;
  if (next !== "repeat") throw new UncertainWrite(next === "committed", { cause: error });
  return work();
}
