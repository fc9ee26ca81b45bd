import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { getViewer, safeReturnPath } from "@/server/auth/get-viewer";
import { SignInView } from "./sign-in-view";

export const metadata: Metadata = { title: "Sign in" };

// Auth.js sends people back here with ?error= (and ?code= for a refused password).
const ERRORS: Record<string, string> = {
  CredentialsSignin: "That e-mail and password do not match an account",
  Verification: "That sign-in link has expired or was already used: ask for a new one",
  AccessDenied: "That sign-in link is not valid for any account",
};

export default async function SignInPage({ searchParams }: { searchParams: Promise<Record<string, string | undefined>> }) {
  const params = await searchParams;
  const callbackUrl = safeReturnPath(params.callbackUrl);
  if ((await getViewer())?.actor) redirect(callbackUrl);
  const error = params.code === "rate_limited" ? "Too many sign-in attempts. Wait 15 minutes, or sign in with an e-mailed link." : params.error ? (ERRORS[params.error] ?? "Sign-in failed: try again") : undefined;
  return <SignInView callbackUrl={callbackUrl} error={error} signedOut={params.signedOut === "1" || params.signedOut === "everywhere"} />;
}
