import "server-only";
import { allowMagicLinkRequest } from "@/server/auth/magic-link-limit";
import { magicLinkEmail } from "@/server/email/magic-link-email";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";
import { userExists } from "./user-exists";

/**
 * Queues the magic-link e-mail Auth.js asks for. Addresses without an account get nothing, and
 * neither do requests over the per-address or per-requester limits (the page the requester
 * sees is the same in every case). The link is rebuilt on APP_URL so that a forged Host header
 * cannot point the e-mail at someone else's site.
 */
export async function sendMagicLink(input: { email: string; url: string; expiresAt: Date; address: string }): Promise<void> {
  if (!(await allowMagicLinkRequest(input.email, input.address))) return;
  if (!(await userExists(input.email))) return;
  const link = new URL(input.url);
  await enqueueEmail(magicLinkEmail({ to: input.email, url: appUrl(`${link.pathname}${link.search}`), expiresAt: input.expiresAt }));
}
