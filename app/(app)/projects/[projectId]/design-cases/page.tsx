import type { Metadata } from "next";
import { DesignCasesView } from "./design-cases-view";

export const metadata: Metadata = { title: "Design cases" };

export default function DesignCasesPage() {
  return <DesignCasesView />;
}
