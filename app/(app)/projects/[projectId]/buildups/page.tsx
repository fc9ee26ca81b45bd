import type { Metadata } from "next";
import { draftOnly, type DraftPageProps } from "../_checking/draft-only";
import { BuildupsView } from "./buildups-view";

export const metadata: Metadata = { title: "Build-ups" };

export default async function BuildupsPage({ params }: DraftPageProps) {
  await draftOnly(params);
  return <BuildupsView />;
}
