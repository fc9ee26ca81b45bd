import { Link } from "@/components/shell/link";
import { checkPath, revisionPath } from "@/checking/paths";
import { when } from "@/components/checking/when";
import { SectionHeader } from "@/components/checking/section-header";
import { PaidOnlyNote } from "@/components/billing/paid-only-note";
import { Panel } from "@/components/panel";
import type { TProject } from "@/schemas/project";
import type { TRevisionSummary } from "@/server/services/issue-revision";
import { MuteForm } from "../_checking/mute-form";

/** A project's issued revisions, latest first, and a form to compare two of them. */
export function RevisionsView({ project, revisions, muted, readsDraft, freePlan }: { project: TProject; revisions: TRevisionSummary[]; muted: boolean; readsDraft: boolean; freePlan: { isAdmin: boolean } | null }) {
  return (
    <div className="grid gap-6">
      <SectionHeader title="Revisions" lead={<>Issued copies of the schedule of {project.reference} {project.name}: each is frozen as it was issued, with its results, checks and comments.</>}>
        {readsDraft ? (
          <Link href={checkPath(project.id)} className="rounded-chip border border-line px-3 py-2 text-small hover:bg-sunken">
            Check view
          </Link>
        ) : null}
      </SectionHeader>
      {freePlan ? <PaidOnlyNote what="Issuing revisions" isAdmin={freePlan.isAdmin} /> : null}
      <Panel title="Issued" lead={revisions.length === 0 ? "Nothing has been issued yet" : `${revisions.length} ${revisions.length === 1 ? "revision" : "revisions"}`}>
        {revisions.length === 0 ? (
          <p className="text-small text-muted">A checker issues revision A once every row of the schedule is accepted.</p>
        ) : (
          <table className="w-full text-small">
            <thead className="text-left text-micro uppercase tracking-[0.08em] text-muted">
              <tr>
                <th className="py-2 pr-3">Revision</th>
                <th className="py-2 pr-3">Issued</th>
                <th className="py-2 pr-3">By</th>
                <th className="py-2 pr-3 text-right">Rows</th>
                <th className="py-2 pr-3">Note</th>
                <th className="py-2">Report</th>
              </tr>
            </thead>
            <tbody>
              {revisions.map((r) => (
                <tr key={r.id} className="border-t border-line/60">
                  <td className="py-1.5 pr-3">
                    <Link href={revisionPath(project.id, r.letter)} className="font-semibold text-accent underline-offset-2 hover:underline">
                      Revision {r.letter}
                    </Link>
                  </td>
                  <td className="py-1.5 pr-3">{when(r.issued_at)}</td>
                  <td className="py-1.5 pr-3">{r.issued_by_name}</td>
                  <td className="py-1.5 pr-3 text-right tabular-nums">{r.rows}</td>
                  <td className="py-1.5 pr-3 text-muted">{r.note || "—"}</td>
                  <td className="py-1.5">
                    {/* The PDF stored with the revision as it was issued. */}
                    <a href={`/api/projects/${project.id}/revisions/${r.letter}/report`} download aria-label={`Report of revision ${r.letter} (PDF)`} className="text-accent underline-offset-2 hover:underline">
                      PDF
                    </a>
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        )}
      </Panel>
      {revisions.length >= 2 ? (
        <Panel title="Compare two revisions" lead="Rows added, removed and changed, and the change in every zone total.">
          <form action={`/projects/${project.id}/revisions/compare`} method="get" className="flex flex-wrap items-end gap-3">
            {(["from", "to"] as const).map((name, i) => (
              <label key={name} className="grid gap-1 text-small">
                {name === "from" ? "From" : "To"}
                <select name={name} defaultValue={revisions[i === 0 ? 1 : 0]!.letter} className="rounded-chip border border-line bg-canvas px-3 py-2">
                  {revisions.map((r) => (
                    <option key={r.letter} value={r.letter}>
                      Revision {r.letter}
                    </option>
                  ))}
                </select>
              </label>
            ))}
            <button type="submit" className="rounded-chip bg-accent px-3 py-2 text-small font-semibold text-accent-ink">
              Compare
            </button>
          </form>
        </Panel>
      ) : null}
      <MuteForm projectId={project.id} muted={muted} />
    </div>
  );
}
