"use client";

import { useState, type FormEvent } from "react";
import type { TSheet } from "@/schemas/schedule";
import { SHEET_TITLES } from "@/schedule/sheet-columns";
import type { ErrorDetail } from "@/components/schedule/api-client";
import { useProject } from "@/components/schedule/schedule-context";
import { useScheduleWrites } from "@/components/schedule/use-schedule-writes";

type Phase = { kind: "idle" } | { kind: "uploading"; pct: number } | { kind: "saving" } | { kind: "done"; message: string } | { kind: "failed"; message: string; report: ErrorDetail[] };

/**
 * Sends the file with XMLHttpRequest, whose upload events drive the progress bar (fetch has
 * none); the last tenth of the bar is the server reading, checking and saving in one transaction.
 */
function upload(url: string, file: File, onProgress: (pct: number) => void): Promise<{ status: number; body: unknown }> {
  return new Promise((resolve, reject) => {
    const xhr = new XMLHttpRequest();
    xhr.open("POST", url);
    xhr.setRequestHeader("content-type", file.type || (file.name.endsWith(".xlsx") ? "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet" : "text/csv"));
    xhr.upload.onprogress = (e) => e.lengthComputable && onProgress(Math.round((e.loaded / e.total) * 90));
    xhr.onload = () => resolve({ status: xhr.status, body: JSON.parse(xhr.responseText || "null") });
    xhr.onerror = () => reject(new Error("The upload failed: the server could not be reached"));
    xhr.send(file);
  });
}

export function ImportPanel({ sheet, onClose }: { sheet: TSheet; onClose: () => void }) {
  const { projectId, notify } = useProject();
  const { refresh } = useScheduleWrites();
  const [phase, setPhase] = useState<Phase>({ kind: "idle" });
  const pct = phase.kind === "uploading" ? phase.pct : phase.kind === "saving" ? 95 : phase.kind === "done" ? 100 : 0;

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const file = form.get("file");
    if (!(file instanceof File) || file.size === 0) return setPhase({ kind: "failed", message: "Choose a CSV or XLSX file first", report: [] });
    const which = String(form.get("sheet"));
    const q = new URLSearchParams({ mode: String(form.get("mode")) });
    if (which !== "workbook") q.set("sheet", which);
    setPhase({ kind: "uploading", pct: 0 });
    try {
      const res = await upload(`/api/projects/${projectId}/import?${q}`, file, (p) => setPhase(p >= 90 ? { kind: "saving" } : { kind: "uploading", pct: p }));
      if (res.status !== 200) {
        const err = (res.body as { error?: { message?: string; details?: ErrorDetail[] } })?.error;
        return setPhase({ kind: "failed", message: err?.message ?? `Import refused (${res.status})`, report: err?.details ?? [] });
      }
      const imported = (res.body as { imported: Partial<Record<TSheet, number>> }).imported;
      const message = `Imported ${Object.entries(imported).map(([s, n]) => `${n} ${n === 1 ? "row" : "rows"} into ${SHEET_TITLES[s as TSheet]}`).join(" and ")}`;
      await refresh();
      setPhase({ kind: "done", message });
      notify({ tone: "ok", message });
    } catch (error) {
      setPhase({ kind: "failed", message: (error as Error).message, report: [] });
    }
  }

  return (
    <section aria-label="Import a schedule" className="grid gap-3 rounded-panel border border-line bg-surface p-4 shadow-panel">
      <header className="flex items-start justify-between gap-3">
        <div>
          <h2 className="text-lead font-semibold">Import a schedule</h2>
          <p className="text-small text-muted">CSV or XLSX; columns are matched by heading (name and unit, SI or IP). One bad row and nothing is saved.</p>
        </div>
        <button type="button" onClick={onClose} className="rounded-chip border border-line px-2 py-1 text-small hover:bg-sunken">
          Close
        </button>
      </header>
      <form onSubmit={submit} className="flex flex-wrap items-end gap-3">
        <label className="grid gap-1 text-small font-medium">
          File
          <input name="file" type="file" accept=".csv,.xlsx,text/csv,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet" className="text-small" />
        </label>
        <label className="grid gap-1 text-small font-medium">
          Into
          <select name="sheet" defaultValue={sheet} className="rounded-chip border border-line bg-canvas px-2 py-1.5">
            <option value="surfaces">Surfaces</option>
            <option value="duct_runs">Duct runs</option>
            <option value="workbook">Both (XLSX worksheets by name)</option>
          </select>
        </label>
        <fieldset className="flex gap-3 text-small">
          <legend className="sr-only">How</legend>
          <label className="flex items-center gap-1">
            <input type="radio" name="mode" value="append" defaultChecked /> Add rows
          </label>
          <label className="flex items-center gap-1">
            <input type="radio" name="mode" value="replace" /> Replace the sheet
          </label>
        </fieldset>
        <button type="submit" disabled={phase.kind === "uploading" || phase.kind === "saving"} className="rounded-chip bg-accent px-3 py-2 text-small font-semibold text-accent-ink disabled:opacity-60">
          Import
        </button>
      </form>
      <div className="grid gap-1">
        <div role="progressbar" aria-label="Import progress" aria-valuemin={0} aria-valuemax={100} aria-valuenow={pct} className="h-2 overflow-hidden rounded-full bg-sunken">
          <div className={`h-full transition-[width] ${phase.kind === "failed" ? "bg-danger" : "bg-accent"}`} style={{ width: `${phase.kind === "failed" ? 100 : pct}%` }} />
        </div>
        <p className="text-micro text-muted" aria-live="polite">
          {phase.kind === "uploading" ? `Uploading… ${Math.round((phase.pct / 90) * 100)} %` : phase.kind === "saving" ? "Checking every row and saving…" : phase.kind === "done" ? phase.message : phase.kind === "failed" ? "Nothing was imported." : "Choose a file."}
        </p>
      </div>
      {phase.kind === "failed" ? (
        <div role="alert" className="grid gap-2 rounded-chip border border-danger/40 bg-danger/10 p-3 text-small">
          <p className="font-semibold text-danger">{phase.message}</p>
          {phase.report.length ? (
            <table className="w-full" aria-label="Import report">
              <thead className="text-micro uppercase text-muted">
                <tr>
                  <th className="text-left font-medium">Row</th>
                  <th className="text-left font-medium">Column</th>
                  <th className="text-left font-medium">Problem</th>
                </tr>
              </thead>
              <tbody>
                {phase.report.map((d, i) => (
                  <tr key={i} className="border-t border-danger/20">
                    <td className="py-0.5 pr-3 align-top tabular">{d.row || ""}</td>
                    <td className="py-0.5 pr-3 align-top">{d.column ?? d.field}</td>
                    <td className="py-0.5">{d.message}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          ) : null}
        </div>
      ) : null}
    </section>
  );
}
