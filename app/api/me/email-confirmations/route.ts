// POST /api/me/email-confirmations {token}: confirm the signed-in person's address with the link
// from the sign-up e-mail (a session of that account; 403 for a token or another account).
import { z } from "zod";
import { ZLinkToken } from "@/schemas/auth";
import { resolveSessionActor } from "@/server/auth/resolve-session-actor";
import { AppError } from "@/server/http/app-error";
import { route } from "@/server/http/route";
import { confirmEmail } from "@/server/services/confirm-email";

export const POST = route({ auth: "optional", body: z.object({ token: ZLinkToken }) }, async ({ actor, body }) => {
  if (actor?.via === "token") throw new AppError("forbidden", "An API token cannot confirm an address: sign in as the person");
  const viewer = await resolveSessionActor();
  if (!viewer) throw new AppError("unauthenticated", "Sign in to the account first, then follow the link again");
  return confirmEmail(viewer.user.id, body.token);
});
