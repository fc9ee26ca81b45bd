"use client";

import { useActionState } from "react";
import { Field, FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { acceptInvitationAction } from "../../actions";

/** New people choose a name and password; existing accounts confirm with theirs or their session. */
export function AcceptForm({ token, mode, signedInAs }: { token: string; mode: "new" | "existing" | "signed-in"; signedInAs?: string }) {
  const [state, submit] = useActionState(acceptInvitationAction, null);
  return (
    <form action={submit} className="grid gap-3" noValidate>
      <input type="hidden" name="token" value={token} />
      {signedInAs ? <p className="text-small text-caution">You are signed in as {signedInAs}. Sign out first to accept this invitation for another address.</p> : null}
      {mode === "new" ? (
        <>
          <Field label="Your name" name="name" autoComplete="name" required state={state} />
          <Field label="Choose a password" name="password" type="password" autoComplete="new-password" required hint="At least 10 characters." state={state} />
        </>
      ) : null}
      {mode === "existing" ? <Field label="Your Filmsheet password" name="password" type="password" autoComplete="current-password" required hint="You already have an account: confirm it's you." state={state} /> : null}
      <FormMessage state={state} />
      <div>
        <SubmitButton>Accept and sign in</SubmitButton>
      </div>
    </form>
  );
}
