"use client";

import { ROLES, ROLE_HINTS, ROLE_LABELS, type TRole } from "@/schemas/roles";

/** One checkbox per role, sent as `roles[]`; a person may hold several. */
export function RoleCheckboxes({ defaultRoles = [], error, legend = "Roles", compact = false }: { defaultRoles?: TRole[]; error?: string; legend?: string; compact?: boolean }) {
  return (
    <fieldset className="grid gap-1" aria-invalid={error ? true : undefined}>
      <legend className={compact ? "sr-only" : "mb-1 text-small font-medium"}>{legend}</legend>
      <div className={`flex flex-wrap ${compact ? "gap-x-3 gap-y-1" : "gap-2"}`}>
        {ROLES.map((role) => (
          <label key={role} className={`flex items-center gap-1.5 text-small ${compact ? "" : "rounded-chip border border-line bg-canvas px-2.5 py-1.5"}`} title={ROLE_HINTS[role]}>
            <input type="checkbox" name="roles[]" value={role} defaultChecked={defaultRoles.includes(role)} className="accent-[var(--fs-accent)]" />
            {ROLE_LABELS[role]}
          </label>
        ))}
      </div>
      {error ? <p className="text-small text-danger">{error}</p> : null}
    </fieldset>
  );
}
