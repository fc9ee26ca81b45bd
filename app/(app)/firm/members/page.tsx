import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { listMembers } from "@/server/services/list-members";
import { MembersView } from "./members-view";

export const metadata: Metadata = { title: "Members" };

export default async function MembersPage() {
  const actor = await requirePageActor("/firm/members");
  const isAdmin = hasAnyRole(actor, ["admin"]);
  return <MembersView firmName={actor.firm.name} me={actor.userId} data={isAdmin ? await listMembers(actor) : null} />;
}
