import { Link } from "@/components/shell/link";
import { checkPath } from "@/checking/paths";
import { HistoryList, type HistoryItem } from "@/components/checking/history-list";
import { SectionHeader } from "@/components/checking/section-header";
import { Panel } from "@/components/panel";
import type { TProject } from "@/schemas/project";

/** Every recorded change to a project's data, newest first, a page at a time. */
export function HistoryView({ project, entries, nextBefore }: { project: TProject; entries: HistoryItem[]; nextBefore: number | null }) {
  return (
    <div className="grid gap-6">
      <p className="text-small text-muted">
        <Link href={checkPath(project.id)} className="hover:underline">
          Check
        </Link>{" "}
        / history
      </p>
      <SectionHeader title="History" lead={<>Who changed what in {project.reference}, and when: edits with their values before and after, checks, comments, requests and issued revisions.</>} />
      <Panel title="Changes" lead={entries.length === 0 ? "None yet" : `Newest first`}>
        <HistoryList entries={entries} />
        {nextBefore !== null ? (
          <p className="mt-4">
            <Link href={`/projects/${project.id}/history?before=${nextBefore}`} className="text-small text-accent underline-offset-2 hover:underline">
              Older changes →
            </Link>
          </p>
        ) : null}
      </Panel>
    </div>
  );
}
