// A send_email job sealed under another AUTH_SECRET (a rotated secret with e-mails still queued,
// or another deployment's queue) can never be opened: the task drops it with one log line naming
// the kind of e-mail — not the address or link — instead of failing fifteen times with a cipher
// error. A job sealed with this app's key is sent; any other fault still throws (and is retried).
import { createCipheriv, hkdfSync, randomBytes } from "node:crypto";
import { afterEach, describe, expect, test, vi } from "vitest";
import type { TEmailMessage } from "@/server/email/message";
import { openEmailJob, sendEmailJob } from "@/server/jobs/enqueue-email";
import { seal, UnopenablePayload } from "@/server/jobs/sealed-payload";

const message: TEmailMessage = {
  kind: "magic_link",
  to: "wren@lintel.test",
  subject: "Sign in to Filmsheet",
  text: "Sign in: https://app.example/callback?token=secret-token-123",
  html: "<p>Sign in</p>",
};
const { kind, to, ...secret } = message;

/** AES-256-GCM as the app seals, under a key derived from another secret (written out here). */
function sealedElsewhere(value: unknown, otherSecret: string): string {
  const key = Buffer.from(hkdfSync("sha256", otherSecret, "filmsheet", "job-payload-v1", 32));
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", key, iv);
  const body = Buffer.concat([cipher.update(JSON.stringify(value), "utf8"), cipher.final()]);
  return Buffer.concat([iv, cipher.getAuthTag(), body]).toString("base64url");
}

afterEach(() => vi.restoreAllMocks());

describe("send_email jobs that cannot be opened", () => {
  test("a job sealed with this app's key is opened and sent", async () => {
    const sent: TEmailMessage[] = [];
    const outcome = await sendEmailJob({ kind, to, sealed: seal(secret) }, async (m) => sent.push(m));
    expect(outcome).toBe("sent");
    expect(sent).toEqual([message]);
  });

  test("a job sealed under another secret is dropped with one line naming its kind only", async () => {
    const log = vi.spyOn(console, "error").mockImplementation(() => {});
    const send = vi.fn(async () => {});
    const payload = { kind, to, sealed: sealedElsewhere(secret, "an-older-secret-rotated-away-0123456789") };
    expect(() => openEmailJob(payload)).toThrow(UnopenablePayload);
    await expect(sendEmailJob(payload, send)).resolves.toBe("dropped");
    expect(send).not.toHaveBeenCalled();
    expect(log).toHaveBeenCalledTimes(1);
    const line = String(log.mock.calls[0]![0]);
    expect(line).toContain("magic_link e-mail was dropped");
    expect(line).toContain("another AUTH_SECRET");
    expect(line).not.toContain(to);
    expect(line).not.toContain("secret-token-123");
  });

  test("an altered sealed payload is dropped the same way", async () => {
    vi.spyOn(console, "error").mockImplementation(() => {});
    const raw = Buffer.from(seal(secret), "base64url");
    raw[raw.length - 1] ^= 0x01;
    await expect(sendEmailJob({ kind, to, sealed: raw.toString("base64url") }, async () => {})).resolves.toBe("dropped");
  });

  test("other faults still throw, so the queue retries them: a failing mail server, a malformed message", async () => {
    const down = new Error("connect ECONNREFUSED 127.0.0.1:25");
    await expect(sendEmailJob({ kind, to, sealed: seal(secret) }, async () => Promise.reject(down))).rejects.toBe(down);
    await expect(sendEmailJob({ kind, to, sealed: seal({ subject: "no body" }) }, async () => {})).rejects.toThrow();
  });
});
