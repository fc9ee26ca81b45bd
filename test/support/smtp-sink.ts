import type { AddressInfo } from "node:net";
import { simpleParser, type ParsedMail } from "mailparser";
import { SMTPServer } from "smtp-server";

export interface SmtpSink {
  port: number;
  /** The SMTP_URL the app should send through. */
  url: string;
  messages: ParsedMail[];
  /** The first message to this address (waiting for it), or an error after the timeout. */
  waitFor: (to: string, timeoutMs?: number) => Promise<ParsedMail>;
  close: () => Promise<void>;
}

const recipients = (m: ParsedMail) => (Array.isArray(m.to) ? m.to : m.to ? [m.to] : []).flatMap((a) => a.value.map((v) => v.address?.toLowerCase()));

/** A real SMTP server on 127.0.0.1 that keeps every message it receives, parsed. */
export async function startSmtpSink(port = 0): Promise<SmtpSink> {
  const messages: ParsedMail[] = [];
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    onData(stream, _session, done) {
      simpleParser(stream).then(
        (mail) => {
          messages.push(mail);
          done();
        },
        (error: Error) => done(error),
      );
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => resolve());
  });
  const actual = (server.server.address() as AddressInfo).port;
  return {
    port: actual,
    url: `smtp://127.0.0.1:${actual}?ignoreTLS=true`,
    messages,
    async waitFor(to, timeoutMs = 20_000) {
      const deadline = Date.now() + timeoutMs;
      for (;;) {
        const found = messages.find((m) => recipients(m).includes(to.toLowerCase()));
        if (found) return found;
        if (Date.now() > deadline) throw new Error(`No e-mail to ${to} within ${timeoutMs} ms (got ${messages.length} to others)`);
        await new Promise((r) => setTimeout(r, 100));
      }
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** The first link in a message's text whose path starts with `pathPrefix`, as path + query. */
export function linkIn(mail: ParsedMail, pathPrefix: string): string {
  for (const match of (mail.text ?? "").matchAll(/https?:\/\/[^\s"<>]+/g)) {
    const url = new URL(match[0]);
    if (url.pathname.startsWith(pathPrefix)) return `${url.pathname}${url.search}`;
  }
  throw new Error(`No ${pathPrefix} link in the e-mail "${mail.subject}"`);
}

/** A free TCP port on 127.0.0.1 with nothing listening on it (for "the mail server is down"). */
export async function freePort(): Promise<number> {
  const probe = new SMTPServer({ logger: false });
  await new Promise<void>((resolve) => probe.listen(0, "127.0.0.1", () => resolve()));
  const { port } = probe.server.address() as AddressInfo;
  await new Promise<void>((resolve) => probe.close(() => resolve()));
  return port;
}
