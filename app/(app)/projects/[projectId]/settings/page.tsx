import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { draftOnly, type DraftPageProps } from "../_checking/draft-only";
import { SettingsView } from "./settings-view";

export const metadata: Metadata = { title: "Site and units" };

export default async function SettingsPage({ params }: DraftPageProps) {
  await draftOnly(params);
  const { projectId } = await params;
  const actor = await requirePageActor(`/projects/${projectId}/settings`);
  return <SettingsView isAdmin={hasAnyRole(actor, ["admin"])} />;
}
