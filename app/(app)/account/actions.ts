"use server";
// The account page's action: sign out everywhere (every session of this person, this one too).
import { redirect } from "next/navigation";
import { signOut } from "@/server/auth/auth";
import { resolveSessionActor } from "@/server/auth/resolve-session-actor";
import { revokeUserSessions } from "@/server/auth/user-sessions";
import { action } from "@/server/http/action";

const signOutEverywhereWrapped = action({ auth: "optional" }, async () => {
  const viewer = await resolveSessionActor();
  if (!viewer) redirect("/sign-in");
  await revokeUserSessions(viewer.user.id);
  await signOut({ redirectTo: "/sign-in?signedOut=everywhere" });
});

export async function signOutEverywhereAction(form: FormData): Promise<void> {
  await signOutEverywhereWrapped(null, form);
}
