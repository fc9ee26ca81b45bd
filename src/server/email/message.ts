import "server-only";
import { z } from "zod";

/** One e-mail as the queue carries it: rendered already, so a retry sends the same bytes. */
export const ZEmailMessage = z.object({
  kind: z.enum(["invitation", "magic_link", "password_reset", "email_confirmation", "check_requested", "row_queried", "query_answered", "revision_issued"]),
  to: z.email(),
  subject: z.string().min(1),
  text: z.string().min(1),
  html: z.string().min(1),
});
export type TEmailMessage = z.infer<typeof ZEmailMessage>;

const escape = (s: string) => s.replace(/[&<>"']/g, (c) => `&#${c.charCodeAt(0)};`);

/**
 * Plain text and a simple HTML version of the same words: a heading, paragraphs, one button-like
 * link and a closing note. Inline styles only, since mail clients drop style sheets.
 */
export function renderEmail(parts: { heading: string; paragraphs: string[]; action: { label: string; url: string }; note: string }): { text: string; html: string } {
  const text = [parts.heading, "", ...parts.paragraphs.flatMap((p) => [p, ""]), `${parts.action.label}: ${parts.action.url}`, "", parts.note, "", "— Filmsheet"].join("\n");
  const p = (s: string) => `<p style="margin:0 0 14px;line-height:1.5">${escape(s)}</p>`;
  const html = `<!doctype html><html><body style="margin:0;padding:24px;background:#f3f1ec;font-family:system-ui,sans-serif;color:#1c2026">
<div style="max-width:520px;margin:0 auto;background:#fdfcfa;border:1px solid #d8d3c8;border-radius:12px;padding:28px">
<div style="font-weight:600;color:#1d5c57;margin-bottom:18px">Filmsheet</div>
<h1 style="font-size:20px;margin:0 0 16px">${escape(parts.heading)}</h1>
${parts.paragraphs.map(p).join("\n")}
<p style="margin:22px 0"><a href="${escape(parts.action.url)}" style="background:#1d5c57;color:#fdfcfa;padding:10px 16px;border-radius:6px;text-decoration:none;font-weight:600">${escape(parts.action.label)}</a></p>
<p style="margin:0 0 14px;font-size:13px;color:#5a616d;word-break:break-all">Or paste this address into your browser: ${escape(parts.action.url)}</p>
<p style="margin:0;font-size:13px;color:#5a616d">${escape(parts.note)}</p>
</div></body></html>`;
  return { text, html };
}
