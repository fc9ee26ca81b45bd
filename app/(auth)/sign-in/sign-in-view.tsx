"use client";

import { Link } from "@/components/shell/link";
import { useActionState } from "react";
import { Field, FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { requestMagicLink, signInWithPassword } from "../actions";
import { AuthCard } from "../auth-card";

export function SignInView({ callbackUrl, error, signedOut }: { callbackUrl: string; error?: string; signedOut: boolean }) {
  const [password, submitPassword] = useActionState(signInWithPassword, error ? { ok: false, code: "unauthenticated", message: error } : null);
  const [link, submitLink] = useActionState(requestMagicLink, null);
  return (
    <AuthCard
      title="Sign in"
      lead={signedOut ? "You are signed out. Sign in again to get back to your firm's projects." : "Sign in to your firm's schedules."}
      footer={
        <>
          New firm? <Link href="/sign-up" className="font-medium text-accent underline-offset-2 hover:underline">Create a Filmsheet account</Link>. Joining a colleague? Use the link in your invitation e-mail.
        </>
      }
    >
      <form action={submitPassword} className="grid gap-3" noValidate>
        <input type="hidden" name="callbackUrl" value={callbackUrl} />
        <Field label="E-mail" name="email" type="email" autoComplete="username" required state={password} />
        <Field label="Password" name="password" type="password" autoComplete="current-password" required state={password} />
        <FormMessage state={password} />
        <div className="flex items-center justify-between gap-3">
          <SubmitButton>Sign in</SubmitButton>
          <Link href="/reset-password" className="text-small text-muted underline-offset-2 hover:text-ink hover:underline">
            Forgot your password?
          </Link>
        </div>
      </form>
      <div className="flex items-center gap-3 text-micro uppercase text-muted" aria-hidden="true">
        <span className="h-px flex-1 bg-line" /> or <span className="h-px flex-1 bg-line" />
      </div>
      <form action={submitLink} className="grid gap-3" noValidate aria-label="Sign in with an e-mailed link">
        <input type="hidden" name="callbackUrl" value={callbackUrl} />
        <Field id="magic-email" label="E-mail me a sign-in link" name="email" type="email" autoComplete="email" hint="One click in the e-mail signs you in; the link lasts 15 minutes." state={link} />
        <FormMessage state={link} />
        <div>
          <SubmitButton tone="quiet">Send the link</SubmitButton>
        </div>
      </form>
    </AuthCard>
  );
}
