import { z } from "zod";

/** The roles a firm membership (or an API token) can hold; a person may hold several. */
export const ROLES = ["admin", "consultant", "checker", "viewer"] as const;
export type TRole = (typeof ROLES)[number];

export const ROLE_LABELS: Record<TRole, string> = {
  admin: "Firm admin",
  consultant: "Consultant",
  checker: "Checker",
  viewer: "Viewer",
};

export const ROLE_HINTS: Record<TRole, string> = {
  admin: "members, seats, billing, API tokens",
  consultant: "builds projects and schedules",
  checker: "checks rows, approves revisions",
  viewer: "reads issued revisions and reports",
};

export const ZRole = z.enum(ROLES, { error: `Role must be one of: ${ROLES.join(", ")}` });

/** One or more distinct roles; a form sends them as repeated fields. */
export const ZRoles = z
  .array(ZRole, { error: "Choose at least one role" })
  .min(1, "Choose at least one role")
  .transform((roles) => [...new Set(roles)].sort((a, b) => ROLES.indexOf(a) - ROLES.indexOf(b)));
