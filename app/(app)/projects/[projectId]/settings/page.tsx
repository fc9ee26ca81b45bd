import type { Metadata } from "next";
import { draftOnly, type DraftPageProps } from "../_checking/draft-only";
import { SettingsView } from "./settings-view";

export const metadata: Metadata = { title: "Site and units" };

export default async function SettingsPage({ params }: DraftPageProps) {
  await draftOnly(params);
  return <SettingsView />;
}
