"use client";

import { useEffect, useState } from "react";
import type { TReportBuild } from "@/schemas/reports";
import { api, ApiError } from "@/components/schedule/api-client";

const POLL_MS = 500;
const LINK = "rounded-chip border border-line bg-surface px-3 py-1.5 text-small font-semibold hover:bg-sunken";

/** Follows a report build on the server until it is done or has failed. */
function useReportBuild(projectId: string, initial: TReportBuild | null) {
  const [build, setBuild] = useState<TReportBuild | null>(initial);
  const [error, setError] = useState<string | null>(null);
  const busy = build !== null && (build.status === "queued" || build.status === "running");
  useEffect(() => {
    if (!busy) return;
    let live = true;
    const timer = setTimeout(async () => {
      try {
        const next = await api<TReportBuild>("GET", `/api/projects/${projectId}/reports/${build.id}`);
        if (live) setBuild(next);
      } catch (e) {
        if (live) setError(e instanceof ApiError ? e.message : "The report's progress could not be read");
      }
    }, POLL_MS);
    return () => {
      live = false;
      clearTimeout(timer);
    };
  }, [busy, build, projectId]);
  return { build, setBuild, error, setError, busy };
}

/** The build's progress as a bar with its stage, for screen readers as well. */
function BuildProgress({ build, label }: { build: TReportBuild; label: string }) {
  const pct = Math.round(build.progress * 100);
  return (
    <div className="grid w-64 gap-1" role="status" aria-live="polite">
      <div role="progressbar" aria-label={label} aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} className="h-2 overflow-hidden rounded-full bg-sunken">
        <div className="h-full bg-accent transition-[width]" style={{ width: `${pct}%` }} />
      </div>
      <p className="text-small text-muted">
        {build.status === "queued" ? "Waiting for the report worker…" : `${build.stage}… ${pct} %`}
      </p>
    </div>
  );
}

/**
 * The draft report on the project page: asks the server's report job for it, shows the job's
 * progress, then offers the PDF. (Large projects take several seconds; the page stays usable.)
 */
export function DraftReportButton({ projectId }: { projectId: string }) {
  const { build, setBuild, error, setError, busy } = useReportBuild(projectId, null);
  const start = async () => {
    setError(null);
    try {
      setBuild(await api<TReportBuild>("POST", `/api/projects/${projectId}/reports`, { kind: "draft" }));
    } catch (e) {
      setError(e instanceof ApiError ? e.message : "The report could not be started");
    }
  };
  return (
    <div className="grid justify-items-end gap-1">
      {busy ? (
        <BuildProgress build={build!} label="Draft report progress" />
      ) : (
        <span className="flex flex-wrap items-center justify-end gap-2">
          {build?.status === "done" ? (
            <a href={build.download!} download className={LINK}>
              Download draft report (PDF)
            </a>
          ) : null}
          <button type="button" onClick={start} className={LINK}>
            {build?.status === "done" ? "Build again" : "Draft report (PDF)"}
          </button>
        </span>
      )}
      {build?.status === "done" ? <p className="text-small text-muted">
          {build.pages} pages{build.watermark ? ", marked “not for issue”" : ""}
        </p> : null}
      {build?.status === "failed" ? <p role="alert" className="text-small text-danger">The report could not be built: {build.error}</p> : null}
      {error ? <p role="alert" className="text-small text-danger">{error}</p> : null}
    </div>
  );
}

/**
 * An issued revision's report: its stored PDF, or, while the job that builds it as the revision
 * is issued is still running, that job's progress.
 */
export function RevisionReportLink({ projectId, letter, initial }: { projectId: string; letter: string; initial: TReportBuild | null }) {
  const { build, error, busy } = useReportBuild(projectId, initial);
  const name = `Report of revision ${letter} (PDF)`;
  return (
    <div className="grid justify-items-end gap-1">
      {busy ? (
        <BuildProgress build={build!} label={`Revision ${letter} report progress`} />
      ) : (
        // Stored (or, should its build have failed, built from the frozen snapshot on request).
        <a href={`/api/projects/${projectId}/revisions/${letter}/report`} download className={LINK}>
          {name}
        </a>
      )}
      {error ? <p role="alert" className="text-small text-danger">{error}</p> : null}
    </div>
  );
}
