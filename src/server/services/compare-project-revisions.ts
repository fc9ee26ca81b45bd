import "server-only";
import { compareRevisions, type RevisionComparison } from "@/checking/compare-revisions";
import type { Actor } from "@/server/auth/actor";
import { AppError } from "@/server/http/app-error";
import { getRevisionOrThrow } from "./get-revision";

/** What changed from one issued revision of a project to another. */
export async function compareProjectRevisions(actor: Actor, projectId: string, from: string, to: string): Promise<RevisionComparison & { from: string; to: string }> {
  if (from === to) throw new AppError("invalid_input", "Choose two different revisions", [{ field: "query.to", message: "Same as from" }]);
  const [a, b] = await Promise.all([getRevisionOrThrow(actor, projectId, from), getRevisionOrThrow(actor, projectId, to)]);
  // Always earlier → later, whichever way round they were asked for.
  const [early, late] = a.sequence < b.sequence ? [a, b] : [b, a];
  return { from: early.letter, to: late.letter, ...compareRevisions(early.snapshot, late.snapshot) };
}
