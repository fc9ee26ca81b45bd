"use server";
// Server actions of the sign-in pages: thin wrappers (action()) around the same services the
// API routes use, plus Auth.js's signIn/signOut, which set the session cookie.
import { AuthError } from "next-auth";
import { cookies, headers } from "next/headers";
import { redirect } from "next/navigation";
import { z } from "zod";
import { ZInvitationAccept, ZLinkToken, ZMagicLinkRequest, ZPasswordResetConfirm, ZPasswordResetRequest, ZSignIn, ZSignUp } from "@/schemas/auth";
import { CURRENT_FIRM_COOKIE } from "@/server/auth/actor";
import { SignInRefused, signIn, signOut } from "@/server/auth/auth";
import { clientAddress } from "@/server/auth/client-address";
import { getViewer, safeReturnPath } from "@/server/auth/get-viewer";
import { secureCookies } from "@/server/env";
import { action, type ActionState } from "@/server/http/action";
import { acceptInvitation } from "@/server/services/accept-invitation";
import { confirmEmail } from "@/server/services/confirm-email";
import { requestPasswordReset } from "@/server/services/request-password-reset";
import { resetPassword } from "@/server/services/reset-password";
import { signUpFirm } from "@/server/services/sign-up-firm";

/** Signs in with a password and redirects; a refusal becomes a message on the form. */
async function passwordSignIn(email: string, password: string, returnTo: string): Promise<ActionState> {
  try {
    await signIn("credentials", { email, password, redirectTo: returnTo });
    return { ok: true };
  } catch (error) {
    if (error instanceof SignInRefused && error.code === "rate_limited") {
      const minutes = Math.max(1, Math.ceil((error.retryAfterSeconds ?? 900) / 60));
      return { ok: false, code: "too_many_requests", message: `Too many sign-in attempts. Try again in ${minutes} min, or sign in with an e-mailed link.` };
    }
    if (error instanceof AuthError) return { ok: false, code: "unauthenticated", message: "That e-mail and password do not match an account" };
    throw error;
  }
}

export const signInWithPassword = action({ auth: "public", input: ZSignIn.extend({ callbackUrl: z.string().optional() }) }, ({ input }) =>
  passwordSignIn(input.email, input.password, safeReturnPath(input.callbackUrl)),
);

export const requestMagicLink = action({ auth: "public", input: ZMagicLinkRequest.extend({ callbackUrl: z.string().optional() }) }, async ({ input }) => {
  await signIn("nodemailer", { email: input.email, redirect: false, redirectTo: safeReturnPath(input.callbackUrl) });
  redirect(`/sign-in/check-email?${new URLSearchParams({ email: input.email })}`);
});

export const signUp = action({ auth: "public", input: ZSignUp }, async ({ input }) => {
  await signUpFirm(input);
  return passwordSignIn(input.email, input.password, "/firm");
});

export const askForPasswordReset = action({ auth: "public", input: ZPasswordResetRequest }, async ({ input }) => {
  await requestPasswordReset(input.email);
  return { ok: true, message: `If ${input.email} has a Filmsheet account, a link to choose a new password is on its way. It works for one hour.` };
});

export const chooseNewPassword = action({ auth: "public", input: ZPasswordResetConfirm }, async ({ input }) => {
  const { email } = await resetPassword(input);
  return passwordSignIn(email, input.password, "/projects");
});

export const acceptInvitationAction = action({ auth: "public", input: ZInvitationAccept }, async ({ input }) => {
  const viewer = await getViewer();
  const result = await acceptInvitation(input, { signedIn: viewer?.user ?? null, address: clientAddress(await headers()) });
  if (viewer?.user.id === result.user.id) redirect("/projects");
  // Signed in with the password just chosen (new account) or just confirmed (existing one).
  return passwordSignIn(result.user.email, input.password ?? "", "/projects");
});

/** The sign-up e-mail's link, from a session of that account (the page sends others to sign in). */
export const confirmEmailAction = action({ auth: "optional", input: z.object({ token: ZLinkToken }) }, async ({ input }) => {
  const viewer = await getViewer();
  if (!viewer) return { ok: false, code: "unauthenticated", message: "Sign in to the account first, then follow the link again" };
  const { email } = await confirmEmail(viewer.user.id, input.token);
  return { ok: true, message: `${email} is confirmed. Thank you.` };
});

const signOutWrapped = action({ auth: "public" }, async () => {
  await signOut({ redirectTo: "/sign-in?signedOut=1" });
});

export async function signOutAction(form: FormData): Promise<void> {
  await signOutWrapped(null, form);
}

/** Chooses which of a person's firms the app shows; only a firm they belong to is accepted. */
const switchFirmWrapped = action({ input: z.object({ firmId: z.uuid() }) }, async ({ actor, input }) => {
  if (!actor.firms.some((f) => f.id === input.firmId)) return { ok: false, code: "not_found", message: "No such firm among yours" };
  (await cookies()).set(CURRENT_FIRM_COOKIE, input.firmId, { httpOnly: true, sameSite: "lax", path: "/", secure: secureCookies(), maxAge: 400 * 86_400 });
  redirect("/projects");
});

export async function switchFirmAction(form: FormData): Promise<void> {
  await switchFirmWrapped(null, form);
}
