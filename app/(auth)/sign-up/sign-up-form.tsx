"use client";

import { Link } from "@/components/shell/link";
import { useActionState } from "react";
import { Field, FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { signUp } from "../actions";
import { AuthCard } from "../auth-card";

export function SignUpForm() {
  const [state, submit] = useActionState(signUp, null);
  return (
    <AuthCard
      title="Create your firm's account"
      lead="You become the firm admin: you invite colleagues, give them roles and manage the seats."
      footer={
        <>
          Already have an account? <Link href="/sign-in" className="font-medium text-accent underline-offset-2 hover:underline">Sign in</Link>.
        </>
      }
    >
      <form action={submit} className="grid gap-3" noValidate>
        <Field label="Firm name" name="firmName" autoComplete="organization" required state={state} />
        <Field label="Your name" name="name" autoComplete="name" required state={state} />
        <Field label="Work e-mail" name="email" type="email" autoComplete="email" required state={state} />
        <Field label="Password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." state={state} />
        <FormMessage state={state} />
        <div>
          <SubmitButton>Create account</SubmitButton>
        </div>
      </form>
    </AuthCard>
  );
}
