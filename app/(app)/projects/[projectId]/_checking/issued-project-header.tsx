import { Link } from "@/components/shell/link";
import { revisionsPath } from "@/checking/paths";
import type { TProject } from "@/schemas/project";
import { ProjectTitle } from "../project-title";

/** The project header a viewer sees: the project's name and its issued revisions, nothing of the draft. */
export function IssuedProjectHeader({ project }: { project: TProject }) {
  return (
    <header className="grid gap-3">
      <ProjectTitle reference={project.reference} name={project.name}>
        Issued revisions only · read only
      </ProjectTitle>
      <nav aria-label="Project" className="flex gap-1 border-b border-line">
        <Link href={revisionsPath(project.id)} aria-current="page" className="-mb-px border-b-2 border-accent px-3 py-2 text-small font-medium text-ink">
          Revisions
        </Link>
      </nav>
    </header>
  );
}
