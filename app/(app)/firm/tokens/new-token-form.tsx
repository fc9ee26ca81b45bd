"use client";

import { useActionState } from "react";
import { Field, FormMessage, SubmitButton, fieldError } from "@/components/forms/form-parts";
import { Panel } from "@/components/panel";
import { TOKEN_LIFETIME_DAYS } from "@/schemas/firm";
import { ROLES, ROLE_LABELS } from "@/schemas/roles";
import { createTokenAction } from "../actions";

const select = "rounded-chip border border-line bg-canvas px-3 py-2 text-body";

export function NewTokenForm() {
  const [state, submit] = useActionState(createTokenAction, null);
  const secret = state?.ok ? (state.data?.secret as string | undefined) : undefined;
  return (
    <Panel title="New token">
      <form action={submit} className="grid gap-3 md:grid-cols-[1fr_12rem_10rem_auto] md:items-start" noValidate>
        <Field label="Name" name="name" placeholder="Nightly schedule export" required state={state} />
        <label className="grid gap-1 text-small font-medium">
          Role
          <select name="role" defaultValue="viewer" className={select}>
            {ROLES.map((r) => (
              <option key={r} value={r}>{ROLE_LABELS[r]}</option>
            ))}
          </select>
          {fieldError(state, "role") ? <span className="font-normal text-danger">{fieldError(state, "role")}</span> : null}
        </label>
        <label className="grid gap-1 text-small font-medium">
          Expires after
          <select name="expiresInDays" defaultValue="90" className={select}>
            {TOKEN_LIFETIME_DAYS.map((d) => (
              <option key={d} value={d}>{d} days</option>
            ))}
          </select>
        </label>
        <div className="md:pt-6">
          <SubmitButton>Create token</SubmitButton>
        </div>
      </form>
      <div className="mt-3 grid gap-2">
        <FormMessage state={state} />
        {secret ? (
          <div className="grid gap-1 rounded-chip border border-caution/50 bg-caution/10 p-3">
            <p className="text-small font-semibold text-caution">Copy this token now: it is shown only once.</p>
            <code aria-label="New token secret" className="select-all break-all font-mono text-small">{secret}</code>
          </div>
        ) : null}
      </div>
    </Panel>
  );
}
