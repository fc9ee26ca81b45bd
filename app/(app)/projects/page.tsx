import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { PlanNotice } from "@/components/billing/plan-notice";
import { getPlan } from "@/server/services/get-plan";
import { listProjects } from "@/server/services/list-projects";
import { ProjectsView } from "./projects-view";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage({ searchParams }: { searchParams: Promise<{ archived?: string }> }) {
  const actor = await requirePageActor("/projects");
  const archived = (await searchParams).archived === "1";
  const [projects, plan] = await Promise.all([listProjects(actor, { archived }), getPlan(actor.firm.id)]);
  const notice = archived ? null : <PlanNotice plan={plan} projects={projects.length} isAdmin={hasAnyRole(actor, ["admin"])} />;
  return <ProjectsView firmName={actor.firm.name} projects={projects} archived={archived} canCreate={!archived && hasAnyRole(actor, ["consultant"])} notice={notice} />;
}
