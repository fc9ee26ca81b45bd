import "server-only";
import type { TRole } from "@/schemas/roles";

/**
 * Who reads a project's draft (its live schedule, workings, checks and history): everyone in the
 * firm but viewers, who see issued revisions only.
 */
export const DRAFT_READERS: readonly TRole[] = ["consultant", "checker", "admin"];
