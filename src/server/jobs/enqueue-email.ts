import "server-only";
import type { Knex } from "knex";
import { z } from "zod";
import { db } from "@/server/db/knex";
import { ZEmailMessage, type TEmailMessage } from "@/server/email/message";
import { EMAIL_PRIORITY } from "./job-priorities";
import { ensureJobSchema } from "./job-schema";
import { seal, unseal, UnopenablePayload } from "./sealed-payload";

/** Sending is retried with growing pauses (about 2 s, 7 s, 20 s … up to 6 h) this many times. */
export const EMAIL_MAX_ATTEMPTS = 15;

/** A send_email job as stored: kind and address in clear (to find and purge jobs), the rest sealed. */
const ZSealedEmailJob = z.object({ kind: ZEmailMessage.shape.kind, to: z.string(), sealed: z.string() });

/**
 * Queues an e-mail in PostgreSQL. Given the caller's transaction, the message is queued only if
 * the change it announces commits (an invitation and its e-mail are saved together or not at
 * all). The worker sends it and retries while the mail server is down. Subject and body (which
 * carry sign-in, reset and invitation links) are sealed with a key derived from AUTH_SECRET, so
 * the jobs table never holds a live link in clear. E-mail jobs go ahead of report builds.
 */
export async function enqueueEmail(message: TEmailMessage, trx?: Knex.Transaction): Promise<void> {
  await ensureJobSchema();
  const { kind, to, ...secret } = message;
  const payload = { kind, to, sealed: seal(secret) };
  await (trx ?? db()).raw("SELECT graphile_worker.add_job('send_email', ?::json, max_attempts => ?, priority => ?)", [JSON.stringify(payload), EMAIL_MAX_ATTEMPTS, EMAIL_PRIORITY]);
}

/** The message a send_email job carries (sealed; a job queued before sealing, in clear). */
export function openEmailJob(payload: unknown): TEmailMessage {
  const sealed = ZSealedEmailJob.safeParse(payload);
  if (!sealed.success) return ZEmailMessage.parse(payload);
  return ZEmailMessage.parse({ kind: sealed.data.kind, to: sealed.data.to, ...(unseal(sealed.data.sealed) as object) });
}

/**
 * The send_email task: opens the job and sends it. A job sealed under another AUTH_SECRET (the
 * secret was rotated with e-mails still queued, or another deployment's queue) can never be
 * opened: it is logged and dropped, not retried fifteen times with a cipher error. The log names
 * the kind of e-mail, never the address or the link.
 */
export async function sendEmailJob(payload: unknown, send: (m: TEmailMessage) => Promise<unknown>): Promise<"sent" | "dropped"> {
  let message: TEmailMessage;
  try {
    message = openEmailJob(payload);
  } catch (error) {
    if (!(error instanceof UnopenablePayload)) throw error;
    const kind = (payload as { kind?: unknown } | null)?.kind;
    console.error(`[jobs] a ${typeof kind === "string" ? kind : "send_email"} e-mail was dropped: ${error.message}`);
    return "dropped";
  }
  await send(message);
  return "sent";
}
