import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { listInvitations } from "@/server/services/list-invitations";
import { InvitationsView } from "./invitations-view";

export const metadata: Metadata = { title: "Invitations" };

export default async function InvitationsPage() {
  const actor = await requirePageActor("/firm/invitations");
  return <InvitationsView invitations={hasAnyRole(actor, ["admin"]) ? await listInvitations(actor) : null} />;
}
