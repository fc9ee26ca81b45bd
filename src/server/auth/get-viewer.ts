import "server-only";
import { redirect, unstable_rethrow } from "next/navigation";
import { cache } from "react";
import type { Actor } from "./actor";
import { resolveSessionActor, type SessionUser } from "./resolve-session-actor";

/**
 * The signed-in person for pages and the header, once per request. A database that does not
 * answer shows the page signed out rather than failing it (the health check reports it).
 */
export const getViewer = cache(async (): Promise<{ user: SessionUser; actor: Actor | null; sessionId: string } | null> => {
  try {
    return await resolveSessionActor();
  } catch (error) {
    unstable_rethrow(error); // Next's own signals (e.g. "this page is dynamic") must pass through
    console.error("Could not read the session:", error instanceof Error ? error.message : error);
    return null;
  }
});

/**
 * For pages of the signed-in sections: sends people who are not signed in to the sign-in page
 * (and back here afterwards), and people who belong to no firm to a page that says so.
 */
export async function requirePageActor(path: string): Promise<Actor> {
  const viewer = await getViewer();
  if (!viewer) redirect(`/sign-in?${new URLSearchParams({ callbackUrl: path })}`);
  if (!viewer.actor) redirect("/no-firm");
  return viewer.actor;
}

/** A same-site path to return to after signing in; anything else becomes /projects. */
export function safeReturnPath(value: unknown): string {
  return typeof value === "string" && value.startsWith("/") && !value.startsWith("//") && !value.startsWith("/\\") ? value : "/projects";
}
