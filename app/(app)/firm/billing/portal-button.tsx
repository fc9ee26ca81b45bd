"use client";

import { useActionState } from "react";
import { FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { openPortalAction } from "./actions";

/** Opens Stripe's billing portal: the card on file, overdue invoices, cancelling. */
export function PortalButton() {
  const [state, submit] = useActionState(openPortalAction, null);
  return (
    <form action={submit} className="grid gap-2">
      <SubmitButton tone="quiet">Manage payment</SubmitButton>
      <FormMessage state={state} />
    </form>
  );
}
