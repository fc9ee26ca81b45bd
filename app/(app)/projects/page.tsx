import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { listProjects } from "@/server/services/list-projects";
import { ProjectsView } from "./projects-view";

export const metadata: Metadata = { title: "Projects" };

export default async function ProjectsPage() {
  const actor = await requirePageActor("/projects");
  const projects = await listProjects(actor);
  return <ProjectsView firmName={actor.firm.name} projects={projects} canCreate={hasAnyRole(actor, ["consultant"])} />;
}
