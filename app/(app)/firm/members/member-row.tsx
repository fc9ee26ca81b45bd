"use client";

import { useActionState } from "react";
import { FormMessage, SubmitButton, fieldError } from "@/components/forms/form-parts";
import { RoleCheckboxes } from "@/components/forms/role-checkboxes";
import type { TRole } from "@/schemas/roles";
import { changeRolesAction, removeMemberAction } from "../actions";

type Member = { id: number; name: string | null; email: string; roles: TRole[] };

/** One member: name, roles to tick and save, and removal (asks first). */
export function MemberRow({ member, isMe }: { member: Member; isMe: boolean }) {
  const [roles, saveRoles] = useActionState(changeRolesAction, null);
  const [removal, remove] = useActionState(removeMemberAction, null);
  const label = member.name ?? member.email;
  return (
    <li className="grid gap-2 py-3 md:grid-cols-[minmax(12rem,1fr)_2fr_auto] md:items-center" aria-label={label}>
      <div className="min-w-0">
        <p className="truncate font-medium">
          {label} {isMe ? <span className="text-micro font-normal text-muted">(you)</span> : null}
        </p>
        <p className="truncate text-small text-muted">{member.email}</p>
      </div>
      <form action={saveRoles} className="flex flex-wrap items-center gap-3" aria-label={`Roles of ${label}`}>
        <input type="hidden" name="userId" value={member.id} />
        <RoleCheckboxes defaultRoles={member.roles} legend={`Roles of ${label}`} compact error={fieldError(roles, "roles")} />
        <SubmitButton tone="quiet" className="py-1">Save roles</SubmitButton>
      </form>
      <form
        action={remove}
        onSubmit={(e) => {
          if (!confirm(`Remove ${label} from the firm? They lose access at once.`)) e.preventDefault();
        }}
      >
        <input type="hidden" name="userId" value={member.id} />
        <SubmitButton tone="danger" className="py-1">Remove</SubmitButton>
      </form>
      <div className="md:col-span-3 empty:hidden">
        {roles ? <FormMessage state={roles} /> : null}
        {removal ? <FormMessage state={removal} /> : null}
      </div>
    </li>
  );
}
