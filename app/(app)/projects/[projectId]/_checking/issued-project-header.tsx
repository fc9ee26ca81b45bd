import Link from "next/link";
import { revisionsPath } from "@/checking/paths";
import type { TProject } from "@/schemas/project";

/** The project header a viewer sees: the project's name and its issued revisions, nothing of the draft. */
export function IssuedProjectHeader({ project }: { project: TProject }) {
  return (
    <header className="grid gap-3">
      <div>
        <p className="text-small text-muted">
          <Link href="/projects" className="hover:underline">
            Projects
          </Link>{" "}
          / <span className="font-mono">{project.reference}</span>
        </p>
        <h1 className="text-headline font-semibold">{project.name}</h1>
        <p className="text-small text-muted">Issued revisions only · read only</p>
      </div>
      <nav aria-label="Project" className="flex gap-1 border-b border-line">
        <Link href={revisionsPath(project.id)} aria-current="page" className="-mb-px border-b-2 border-accent px-3 py-2 text-small font-medium text-ink">
          Revisions
        </Link>
      </nav>
    </header>
  );
}
