// The SMTP sink of the browser tests: a real SMTP server on 127.0.0.1 (smtp-server) that parses
// every message (mailparser) and writes it as one JSON file into a folder the tests read. It runs
// inside `npm test` itself, after the packages are installed.
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";

/** Starts the sink on a free port; returns its port, its folder and a stop function. */
export async function startMailSink(dir) {
  const [{ SMTPServer }, { simpleParser }] = await Promise.all([import("smtp-server"), import("mailparser")]);
  rmSync(dir, { recursive: true, force: true });
  mkdirSync(dir, { recursive: true });
  let serial = 0;
  const server = new SMTPServer({
    secure: false,
    authOptional: true,
    disabledCommands: ["STARTTLS", "AUTH"],
    logger: false,
    onData(stream, _session, done) {
      simpleParser(stream).then(
        (mail) => {
          const to = (Array.isArray(mail.to) ? mail.to : mail.to ? [mail.to] : []).flatMap((a) => a.value.map((v) => v.address?.toLowerCase()));
          const message = { to, subject: mail.subject ?? "", kind: mail.headers.get("x-filmsheet-kind") ?? null, text: mail.text ?? "", received: new Date().toISOString() };
          writeFileSync(join(dir, `${String(++serial).padStart(5, "0")}.json`), JSON.stringify(message, null, 2));
          done();
        },
        (error) => done(error),
      );
    },
  });
  await new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(0, "127.0.0.1", resolve);
  });
  const port = server.server.address().port;
  return { port, dir, stop: () => new Promise((resolve) => server.close(() => resolve())) };
}
