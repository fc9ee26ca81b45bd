// DELETE /api/me/sessions: sign out every other browser of the signed-in person (this one stays
// signed in; the account page's "Sign out everywhere" also ends this one). People only: 403 for a token.
import { resolveSessionActor } from "@/server/auth/resolve-session-actor";
import { revokeUserSessions } from "@/server/auth/user-sessions";
import { AppError } from "@/server/http/app-error";
import { route } from "@/server/http/route";

export const DELETE = route({ auth: "optional" }, async ({ actor }) => {
  if (actor?.via === "token") throw new AppError("forbidden", "An API token cannot sign anyone out: sign in as the person");
  const viewer = await resolveSessionActor();
  if (!viewer) throw new AppError("unauthenticated", "Sign in first");
  return { revoked: await revokeUserSessions(viewer.user.id, viewer.sessionId) };
});
