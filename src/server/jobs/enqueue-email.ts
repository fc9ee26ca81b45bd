import "server-only";
import type { Knex } from "knex";
import { db } from "@/server/db/knex";
import type { TEmailMessage } from "@/server/email/message";
import { ensureJobSchema } from "./job-schema";

/** Sending is retried with growing pauses (about 2 s, 7 s, 20 s … up to 6 h) this many times. */
export const EMAIL_MAX_ATTEMPTS = 15;

/**
 * Queues an e-mail in PostgreSQL. Given the caller's transaction, the message is queued only if
 * the change it announces commits (an invitation and its e-mail are saved together or not at
 * all). The worker sends it and retries while the mail server is down.
 */
export async function enqueueEmail(message: TEmailMessage, trx?: Knex.Transaction): Promise<void> {
  await ensureJobSchema();
  await (trx ?? db()).raw("SELECT graphile_worker.add_job('send_email', ?::json, max_attempts => ?)", [JSON.stringify(message), EMAIL_MAX_ATTEMPTS]);
}
