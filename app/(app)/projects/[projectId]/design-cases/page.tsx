import type { Metadata } from "next";
import { draftOnly, type DraftPageProps } from "../_checking/draft-only";
import { DesignCasesView } from "./design-cases-view";

export const metadata: Metadata = { title: "Design cases" };

export default async function DesignCasesPage({ params }: DraftPageProps) {
  await draftOnly(params);
  return <DesignCasesView />;
}
