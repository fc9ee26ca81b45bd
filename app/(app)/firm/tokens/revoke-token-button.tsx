"use client";

import { useActionState } from "react";
import { SubmitButton } from "@/components/forms/form-parts";
import { revokeTokenAction } from "../actions";

export function RevokeTokenButton({ tokenId, name }: { tokenId: string; name: string }) {
  const [state, revoke] = useActionState(revokeTokenAction, null);
  return (
    <form
      action={revoke}
      onSubmit={(e) => {
        if (!confirm(`Revoke “${name}”? Programs using it are refused from now on.`)) e.preventDefault();
      }}
    >
      <input type="hidden" name="tokenId" value={tokenId} />
      <SubmitButton tone="danger" className="py-1">Revoke</SubmitButton>
      {state && !state.ok ? <span className="ml-2 text-small text-danger">{state.message}</span> : null}
    </form>
  );
}
