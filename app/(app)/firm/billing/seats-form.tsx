"use client";

import { useActionState } from "react";
import { Field, FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { buySeatsAction, changeSeatsAction } from "./actions";

/**
 * Buys seats through Checkout (no subscription yet) or changes the subscription's seat count.
 * The smallest count offered is the seats in use; the server refuses fewer with a reason.
 */
export function SeatsForm({ mode, suggested, minimum, priceLabel }: { mode: "buy" | "change"; suggested: number; minimum: number; priceLabel: string | null }) {
  const [state, submit] = useActionState(mode === "buy" ? buySeatsAction : changeSeatsAction, null);
  // After a refusal the form shows what was typed, not the suggestion.
  const typed = state && !state.ok ? state.values?.seats : undefined;
  return (
    <form action={submit} className="grid gap-3" noValidate>
      <div className="flex flex-wrap items-start gap-3">
        <Field
          label="Seats"
          name="seats"
          type="number"
          inputMode="numeric"
          min={1}
          step={1}
          size={6}
          defaultValue={typed ?? suggested}
          required
          hint={`At least ${minimum} (in use now)${priceLabel ? ` · ${priceLabel}` : ""}`}
          state={state}
        />
        <div className="pt-6">
          <SubmitButton>{mode === "buy" ? "Continue to checkout" : "Change seats"}</SubmitButton>
        </div>
      </div>
      <FormMessage state={state} />
    </form>
  );
}
