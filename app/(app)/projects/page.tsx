import type { Metadata } from "next";
import { EmptyState } from "@/components/empty-state";

export const metadata: Metadata = { title: "Projects" };

export default function ProjectsPage() {
  return (
    <EmptyState title="Projects" lead="Each project holds a schedule of external surfaces and duct runs, its design cases, zones and revisions.">
      No projects yet. Creating projects arrives with sign-in.
    </EmptyState>
  );
}
