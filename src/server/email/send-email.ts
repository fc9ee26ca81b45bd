import "server-only";
import nodemailer, { type Transporter } from "nodemailer";
import { env } from "@/server/env";
import type { TEmailMessage } from "./message";

let transport: Transporter | undefined;

/** Hands one message to the SMTP server; throws if it is not accepted, so the job is retried. */
export async function sendEmail(message: TEmailMessage): Promise<void> {
  transport ??= nodemailer.createTransport(env().SMTP_URL);
  await transport.sendMail({
    from: env().MAIL_FROM,
    to: message.to,
    subject: message.subject,
    text: message.text,
    html: message.html,
    headers: { "X-Filmsheet-Kind": message.kind },
  });
}
