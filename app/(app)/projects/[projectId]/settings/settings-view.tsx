"use client";

import { useRouter } from "next/navigation";
import { useState, type FormEvent } from "react";
import { METHOD_OPTIONS, PROJECT_NUMBERS, TERRAIN_OPTIONS, UNIT_OPTIONS, WIND_LAW_OPTIONS } from "@/schemas/schedule-fields";
import { FieldInputs, ItemCard, readFields, serverErrors, useSaveState, type FieldDef } from "@/components/forms/item-form";
import { api } from "@/components/schedule/api-client";
import { useProject, useSchedule } from "@/components/schedule/schedule-context";
import { useScheduleWrites } from "@/components/schedule/use-schedule-writes";

const FIELDS: FieldDef[] = [
  { name: "reference", label: "Reference", kind: "text" },
  { name: "name", label: "Name", kind: "text" },
  { name: "altitude_m", label: "Site altitude", kind: "number", spec: PROJECT_NUMBERS.altitude_m, hint: "Sets the air pressure the properties are taken at" },
  { name: "terrain", label: "Terrain around the site", kind: "select", options: TERRAIN_OPTIONS, hint: "Roughness that slows the wind near the ground" },
  { name: "wind_law", label: "Wind profile", kind: "select", options: WIND_LAW_OPTIONS },
  {
    name: "unit_system",
    label: "Project units",
    kind: "select",
    options: UNIT_OPTIONS,
    hint: "The units of the project's reports and exports, and the view of anyone who has not picked their own (the SI/IP switch on the schedule is each person's own view). Values are stored in SI",
  },
  { name: "default_method", label: "Exterior convection method", kind: "select", options: METHOD_OPTIONS, hint: "For every surface without its own" },
];

export function SettingsView({ isAdmin }: { isAdmin: boolean }) {
  const s = useSchedule();
  const { system, canEdit } = useProject();
  const { project } = useScheduleWrites();
  const st = useSaveState();
  const router = useRouter();
  const [typed, setTyped] = useState("");
  const [deleteError, setDeleteError] = useState<string | null>(null);

  async function submit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const { values, errors } = readFields(FIELDS, new FormData(e.currentTarget), system);
    st.setErrors(errors);
    if (Object.keys(errors).length) return st.setMessage({ tone: "error", text: "Not saved: fix the fields marked" });
    try {
      await project.mutateAsync(values);
      st.setMessage({ tone: "ok", text: "Saved" });
    } catch (error) {
      const { message, fields } = serverErrors(error);
      st.setErrors(fields);
      st.setMessage({ tone: "error", text: message });
    }
  }

  // Archiving keeps everything (issued revisions and their reports above all) but makes the
  // project read-only and lists it apart; an admin brings it back the same way.
  async function toggleArchive() {
    try {
      const archived = s.project.archived_at !== null;
      if (archived) await api("DELETE", `/api/projects/${s.project.id}/archive?version=${s.project.version}`);
      else await api("POST", `/api/projects/${s.project.id}/archive`, { version: s.project.version });
      router.push(archived ? `/projects/${s.project.id}` : "/projects?archived=1");
      router.refresh();
    } catch (error) {
      setDeleteError((error as Error).message);
    }
  }

  async function remove() {
    try {
      await api("DELETE", `/api/projects/${s.project.id}?version=${s.project.version}`);
      router.push("/projects");
      router.refresh();
    } catch (error) {
      setDeleteError((error as Error).message);
    }
  }

  return (
    <div className="grid gap-4">
      <ItemCard
        key={`${s.project.version}-${system}`}
        title="Site and units"
        onSubmit={submit}
        message={st.message}
        actions={canEdit ? <button type="submit" className="rounded-chip bg-accent px-3 py-1.5 text-small font-semibold text-accent-ink">Save</button> : null}
      >
        <div className="grid gap-3 sm:grid-cols-2 lg:grid-cols-4">
          <FieldInputs fields={FIELDS} values={s.project as unknown as Record<string, unknown>} errors={st.errors} system={system} idPrefix="project" disabled={!canEdit} />
        </div>
      </ItemCard>
      {isAdmin ? (
        <section aria-label="Archive the project" className="grid gap-2 rounded-panel border border-line bg-surface p-4">
          <h2 className="font-semibold">{s.project.archived_at === null ? "Archive the project" : "Archived project"}</h2>
          <p className="text-small text-muted">
            {s.project.archived_at === null
              ? "Keeps the schedule, its checks and every issued revision with its report, read-only, under Archived projects."
              : `Archived on ${new Date(s.project.archived_at).toLocaleDateString("en-GB")}: read-only. Bring it back to change it again.`}
          </p>
          <div>
            <button type="button" onClick={toggleArchive} className="rounded-chip border border-line px-3 py-1.5 text-small font-semibold">
              {s.project.archived_at === null ? "Archive project" : "Bring back"}
            </button>
          </div>
        </section>
      ) : null}
      {isAdmin ? (
        <section aria-label="Delete the project" className="grid gap-2 rounded-panel border border-danger/40 bg-surface p-4">
          <h2 className="font-semibold text-danger">Delete the project</h2>
          <p className="text-small text-muted">Deletes the schedule, design cases, zones and build-ups for good (a project with issued revisions is archived instead). Type the reference {s.project.reference} to confirm.</p>
          <div className="flex flex-wrap gap-2">
            <input aria-label="Reference to confirm" value={typed} onChange={(e) => setTyped(e.target.value)} className="rounded-chip border border-line bg-canvas px-2 py-1.5 text-small" />
            <button type="button" disabled={typed !== s.project.reference} onClick={remove} className="rounded-chip bg-danger px-3 py-1.5 text-small font-semibold text-accent-ink disabled:opacity-50">
              Delete project
            </button>
          </div>
          {deleteError ? <p role="alert" className="text-small text-danger">{deleteError}</p> : null}
        </section>
      ) : null}
    </div>
  );
}
