"use client";

import { QueryClient, QueryClientProvider, useQuery } from "@tanstack/react-query";
import { createContext, useCallback, useContext, useMemo, useState, type ReactNode } from "react";
import type { TPreferences } from "@/schemas/preferences";
import type { TSchedule } from "@/schemas/schedule";
import { scheduleFromText } from "@/schedule/packed-schedule";
import type { UnitSystem } from "@/units/units";
import { api } from "./api-client";
import { PREFERENCES_KEY, usePreferences } from "./use-preferences";

export interface Notice {
  id: number;
  tone: "error" | "ok";
  message: string;
  lines?: string[];
  /** A notice of a kind replaces the last one of that kind (edit errors do not stack); dismiss(key) removes it. */
  key?: string;
}

interface ProjectContext {
  projectId: string;
  canEdit: boolean;
  /** Units shown: the person's own choice, or the project's when they have not chosen. */
  system: UnitSystem;
  /** The project's own units: the default view, and the units of its reports and exports. */
  projectSystem: UnitSystem;
  /** The person's own choice, saved with their view settings (never a change to the project); null follows the project. */
  setSystem: (s: UnitSystem | null) => void;
  notices: Notice[];
  notify: (n: Omit<Notice, "id">) => void;
  dismiss: (idOrKey: number | string) => void;
}

const Ctx = createContext<ProjectContext | null>(null);
export const scheduleKey = (projectId: string) => ["schedule", projectId] as const;

/**
 * The project's data for every page under /projects/[id]: one TanStack Query cache seeded with
 * the schedule the server loaded (handed over packed, as JSON text), the units shown, and the notices (errors and confirmations).
 */
export function ScheduleProvider({ initialJson, preferences, canEdit, children }: { initialJson: string; preferences: TPreferences; canEdit: boolean; children: ReactNode }) {
  const [client] = useState(() => new QueryClient({ defaultOptions: { queries: { staleTime: 30_000, refetchOnWindowFocus: false } } }));
  // The schedule packed as JSON text (src/schedule/packed-schedule.ts), read once and unpacked
  // into the shape the API answers, which a refetch brings.
  const [initial] = useState(() => scheduleFromText(initialJson));
  useState(() => {
    client.setQueryData(scheduleKey(initial.project.id), initial);
    client.setQueryData(PREFERENCES_KEY, preferences);
  });
  return (
    <QueryClientProvider client={client}>
      <ProjectState projectId={initial.project.id} canEdit={canEdit} unitSystem={initial.project.unit_system}>
        {children}
      </ProjectState>
    </QueryClientProvider>
  );
}

function ProjectState({ projectId, canEdit, unitSystem, children }: { projectId: string; canEdit: boolean; unitSystem: UnitSystem; children: ReactNode }) {
  const [notices, setNotices] = useState<Notice[]>([]);
  const { data } = useQuery({ queryKey: scheduleKey(projectId), queryFn: () => api<TSchedule>("GET", `/api/projects/${projectId}/schedule`) });
  const stored = data?.project.unit_system ?? unitSystem;
  const notify = useCallback(
    (n: Omit<Notice, "id">) => setNotices((all) => [...all.filter((o) => !n.key || o.key !== n.key).slice(-3), { ...n, id: Date.now() + Math.random() }]),
    [],
  );
  const dismiss = useCallback(
    (idOrKey: number | string) => setNotices((all) => (all.some((n) => n.id === idOrKey || n.key === idOrKey) ? all.filter((n) => n.id !== idOrKey && n.key !== idOrKey) : all)),
    [],
  );
  const { prefs, update } = usePreferences((message) => notify({ tone: "error", message: `Your view settings were not saved: ${message}` }));
  const own = prefs.unit_system;
  const setSystem = useCallback((s: UnitSystem | null) => update({ unit_system: s }), [update]);
  const value = useMemo(
    () => ({ projectId, canEdit, system: own ?? stored, projectSystem: stored, setSystem, notices, notify, dismiss }),
    [projectId, canEdit, own, stored, setSystem, notices, notify, dismiss],
  );
  return <Ctx.Provider value={value}>{children}</Ctx.Provider>;
}

export function useProject(): ProjectContext {
  const c = useContext(Ctx);
  if (!c) throw new Error("useProject outside ScheduleProvider");
  return c;
}

/** The schedule, always present (seeded from the server render). */
export function useSchedule(): TSchedule {
  const { projectId } = useProject();
  const q = useQuery({ queryKey: scheduleKey(projectId), queryFn: () => api<TSchedule>("GET", `/api/projects/${projectId}/schedule`) });
  return q.data as TSchedule;
}
