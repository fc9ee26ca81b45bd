"use client";

import { Link } from "@/components/shell/link";
import { useActionState } from "react";
import { Field, FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { askForPasswordReset } from "../actions";
import { AuthCard } from "../auth-card";

export function ResetRequestForm() {
  const [state, submit] = useActionState(askForPasswordReset, null);
  return (
    <AuthCard title="Reset your password" lead="We e-mail you a link to choose a new one." footer={<Link href="/sign-in" className="text-accent underline-offset-2 hover:underline">Back to sign-in</Link>}>
      <form action={submit} className="grid gap-3" noValidate>
        <Field label="E-mail" name="email" type="email" autoComplete="email" required state={state} />
        <FormMessage state={state} />
        <div>
          <SubmitButton>Send the link</SubmitButton>
        </div>
      </form>
    </AuthCard>
  );
}
