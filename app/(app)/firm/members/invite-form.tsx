"use client";

import { useActionState } from "react";
import { Field, FormMessage, SubmitButton, fieldError } from "@/components/forms/form-parts";
import { RoleCheckboxes } from "@/components/forms/role-checkboxes";
import { inviteMemberAction } from "../actions";

export function InviteForm({ full }: { full: boolean }) {
  const [state, submit] = useActionState(inviteMemberAction, null);
  return (
    <form action={submit} className="grid gap-3" noValidate aria-label="Invite a colleague">
      <Field label="E-mail" name="email" type="email" placeholder="colleague@firm.com" required state={state} />
      <RoleCheckboxes defaultRoles={["consultant"]} error={fieldError(state, "roles")} />
      <FormMessage state={state} />
      <div>
        <SubmitButton title={full ? "Every seat is taken" : undefined}>Send invitation</SubmitButton>
      </div>
    </form>
  );
}
