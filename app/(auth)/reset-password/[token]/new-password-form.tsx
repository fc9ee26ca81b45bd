"use client";

import { Link } from "@/components/shell/link";
import { useActionState } from "react";
import { Field, FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { chooseNewPassword } from "../../actions";
import { AuthCard } from "../../auth-card";

export function NewPasswordForm({ token }: { token: string }) {
  const [state, submit] = useActionState(chooseNewPassword, null);
  return (
    <AuthCard
      title="Choose a new password"
      lead="Every device signed in to your account is signed out when you save it."
      footer={<Link href="/reset-password" className="text-accent underline-offset-2 hover:underline">Ask for a new link</Link>}
    >
      <form action={submit} className="grid gap-3" noValidate>
        <input type="hidden" name="token" value={token} />
        <Field label="New password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." state={state} />
        <FormMessage state={state} />
        <div>
          <SubmitButton>Save and sign in</SubmitButton>
        </div>
      </form>
    </AuthCard>
  );
}
