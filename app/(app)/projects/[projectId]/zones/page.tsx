import type { Metadata } from "next";
import { draftOnly, type DraftPageProps } from "../_checking/draft-only";
import { ZonesView } from "./zones-view";

export const metadata: Metadata = { title: "Zones" };

export default async function ZonesPage({ params }: DraftPageProps) {
  await draftOnly(params);
  return <ZonesView />;
}
