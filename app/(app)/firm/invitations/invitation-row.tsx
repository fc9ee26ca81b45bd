"use client";

import { useActionState } from "react";
import { FormMessage, SubmitButton } from "@/components/forms/form-parts";
import { ROLE_LABELS, type TRole } from "@/schemas/roles";
import { resendInvitationAction, revokeInvitationAction } from "../actions";

type Invitation = { id: string; email: string; roles: TRole[]; expires_at: string; expired: boolean; send_count: number };

export function InvitationRow({ invitation: i }: { invitation: Invitation }) {
  const [resent, resend] = useActionState(resendInvitationAction, null);
  const [revoked, revoke] = useActionState(revokeInvitationAction, null);
  // UTC on server and browser alike, so the rendered text does not change on hydration.
  const when = `${new Date(i.expires_at).toLocaleString("en-GB", { day: "numeric", month: "short", hour: "2-digit", minute: "2-digit", timeZone: "UTC" })} UTC`;
  return (
    <li className="grid gap-2 py-3 md:grid-cols-[1fr_auto] md:items-center" aria-label={i.email}>
      <div>
        <p className="font-medium">{i.email}</p>
        <p className="text-small text-muted">
          {i.roles.map((r) => ROLE_LABELS[r]).join(", ")} ·{" "}
          {i.expired ? <span className="font-medium text-caution">expired {when}</span> : <>link valid until {when}</>} · sent {i.send_count}×
        </p>
      </div>
      <div className="flex gap-2">
        <form action={resend}>
          <input type="hidden" name="invitationId" value={i.id} />
          <SubmitButton tone="quiet" className="py-1">Resend</SubmitButton>
        </form>
        <form action={revoke}>
          <input type="hidden" name="invitationId" value={i.id} />
          <SubmitButton tone="danger" className="py-1">Revoke</SubmitButton>
        </form>
      </div>
      <div className="md:col-span-2 empty:hidden">
        {resent ? <FormMessage state={resent} /> : null}
        {revoked ? <FormMessage state={revoked} /> : null}
      </div>
    </li>
  );
}
