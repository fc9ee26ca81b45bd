"use client";

import { useActionState } from "react";
import { FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { confirmEmailAction } from "../../actions";

export function ConfirmEmailForm({ token, email }: { token: string; email: string }) {
  const [state, submit] = useActionState(confirmEmailAction, null);
  if (state?.ok) return <p>{state.message}</p>;
  return (
    <form action={submit} className="grid gap-3">
      <input type="hidden" name="token" value={token} />
      <p className="text-small text-muted">Confirm that {email} is your address. If this is not the account you made, sign out first.</p>
      <FormMessage state={state} />
      <div>
        <SubmitButton>Confirm my address</SubmitButton>
      </div>
    </form>
  );
}
