import { Link } from "@/components/shell/link";
import type { ReactNode } from "react";
import { PageHeader, Panel } from "@/components/panel";
import type { TProject } from "@/schemas/project";
import { NewProjectForm } from "./new-project-form";

const date = (d: string | Date) => new Date(d).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });

export function ProjectsView({ firmName, projects, archived = false, canCreate, notice }: { firmName: string; projects: TProject[]; archived?: boolean; canCreate: boolean; notice?: ReactNode }) {
  return (
    <div className="grid gap-6">
      <PageHeader title="Projects" lead={`${firmName}: each project holds a schedule of external surfaces and duct runs, its design cases, zones and revisions.`} />
      {notice}
      <Panel title={archived ? "Archived projects" : "All projects"} lead={`${projects.length} ${projects.length === 1 ? "project" : "projects"}${archived ? ", read-only" : ""}`}>
        <p className="mb-3 text-small">
          {archived ? (
            <Link href="/projects" className="text-accent hover:underline">
              Back to the projects in use
            </Link>
          ) : (
            <Link href="/projects?archived=1" className="text-accent hover:underline">
              Archived projects
            </Link>
          )}
        </p>
        {projects.length === 0 ? (
          <p className="text-small text-muted">{archived ? "No archived projects." : `No projects yet.${canCreate ? " Create the first one below." : " A consultant of your firm creates them."}`}</p>
        ) : (
          <table className="w-full text-left text-small">
            <thead className="text-micro uppercase text-muted">
              <tr>
                <th className="py-2 pr-4 font-medium">Reference</th>
                <th className="py-2 pr-4 font-medium">Name</th>
                <th className="py-2 font-medium">Last changed</th>
              </tr>
            </thead>
            <tbody>
              {projects.map((p) => (
                <tr key={p.id} className="border-t border-line">
                  <td className="py-2 pr-4 font-mono">
                    <Link href={`/projects/${p.id}`} className="hover:underline">
                      {p.reference}
                    </Link>
                  </td>
                  <td className="py-2 pr-4 font-medium">
                    <Link href={`/projects/${p.id}`} className="text-accent hover:underline">
                      {p.name}
                    </Link>
                  </td>
                  <td className="py-2 text-muted">{date(p.updated_at)}</td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Panel>
      {canCreate ? <NewProjectForm /> : null}
    </div>
  );
}
