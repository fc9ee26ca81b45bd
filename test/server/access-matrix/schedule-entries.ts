// Access-matrix rows of the project and schedule routes: consultants, checkers and admins read
// the draft (viewers see issued revisions only; the other firm gets 404 for the demo firm's ids);
// only consultants write (everyone else 403, decided
// before any lookup, so the other firm's admin gets 403 too). The demo schedule is beyond the
// free plan's 40 rows, so entries that add rows put the demo firm on the paid plan first.
import { randomUUID } from "node:crypto";
import { testDb } from "../../support/db";
import { DUCT_VALUES, SURFACE_VALUES, uniqueRef } from "../../support/schedule-fixtures";
import { DEMO_FIRM, demoProjectId, firmId, paidDemoFirm } from "./fixtures";
import type { MatrixEntry, Principal } from "./entries";

type Status = Record<Principal, number>;
const PRINCIPALS: Principal[] = ["anonymous", "admin", "consultant", "checker", "viewer", "other_firm", "admin_token", "revoked_token", "expired_token"];
const refused = { anonymous: 401, revoked_token: 401, expired_token: 401 };
// Viewers read issued revisions only, never the draft schedule.
const read: Status = { ...(Object.fromEntries(PRINCIPALS.map((p) => [p, 200])) as Status), ...refused, viewer: 403, other_firm: 404 };
const adminWrite = (ok: number): Status => ({ ...(Object.fromEntries(PRINCIPALS.map((p) => [p, 403])) as Status), ...refused, admin: ok, admin_token: ok, other_firm: 404 });
const write = (ok: number): Status => ({ ...(Object.fromEntries(PRINCIPALS.map((p) => [p, 403])) as Status), ...refused, consultant: ok });

async function demoIds() {
  const projectId = await demoProjectId();
  const first = (t: string) => testDb()(t).where({ project_id: projectId }).orderBy("name").first("id");
  return { projectId, zoneId: (await first("zones")).id as string, buildupId: (await first("buildups")).id as string, caseId: (await first("design_cases")).id as string };
}

/** Values for a new item of each table of the demo project (names made unique). */
async function newValues(table: string): Promise<Record<string, unknown>> {
  const { zoneId, buildupId } = await demoIds();
  const name = uniqueRef("Matrix");
  switch (table) {
    case "design_cases":
      return { name, kind: "cooling", T_outdoor_C: 27, RH_outdoor_pct: 50, V_met_m_s: 2, wind_from_deg: 90, solar_W_m2: { E: 300 } };
    case "zones":
      return { name, floor_area_m2: 12, T_heating_C: 18, T_cooling_C: 25, RH_inside_pct: 50 };
    case "buildups":
      return { name, layers: [], R_direct_m2K_W: 1.5, absorptance: 0.5, emissivity: 0.9 };
    case "surfaces":
      return { ...SURFACE_VALUES, label: name, zone_id: zoneId, buildup_id: buildupId };
    default:
      return { ...DUCT_VALUES, label: name, zone_id: zoneId };
  }
}

/** A fresh item of the demo project, written straight to the database (version 1). */
async function newItem(table: string): Promise<string> {
  const projectId = await demoProjectId();
  const id = randomUUID();
  const { layers: _l, solar_W_m2, ...values } = await newValues(table);
  const extra = table === "surfaces" || table === "duct_runs" ? { position: 10_000 } : {};
  const solar = solar_W_m2 === undefined ? {} : { solar_W_m2: JSON.stringify(solar_W_m2) };
  await testDb()(table).insert({ ...values, ...extra, ...solar, id, project_id: projectId, firm_id: await firmId(DEMO_FIRM) });
  return id;
}

async function newProject(archived = false): Promise<string> {
  const [row] = await testDb()("projects")
    .insert({ firm_id: await firmId(DEMO_FIRM), name: "Matrix project", reference: uniqueRef("MXP"), ...(archived ? { archived_at: new Date() } : {}) })
    .returning("id");
  return row.id;
}

const TABLES: [string, string, Record<string, unknown>][] = [
  ["design-cases", "design_cases", { T_outdoor_C: 26 }],
  ["zones", "zones", { floor_area_m2: 14 }],
  ["buildups", "buildups", { absorptance: 0.4 }],
  ["surfaces", "surfaces", { area_m2: 8 }],
  ["duct-runs", "duct_runs", { length_m: 11 }],
];

const base = async () => `/api/projects/${await demoProjectId()}`;

export const SCHEDULE_ENTRIES: MatrixEntry[] = [
  { file: "projects/[projectId]/route.ts", method: "PATCH", request: async () => ({ path: `/api/projects/${await newProject()}`, body: { version: 1, unit_system: "IP" } }), expect: write(200) },
  // Deleting and archiving a project: firm admins only (the other firm's admin finds no such project).
  { file: "projects/[projectId]/route.ts", method: "DELETE", request: async () => ({ path: `/api/projects/${await newProject()}?version=1` }), expect: adminWrite(200) },
  { file: "projects/[projectId]/archive/route.ts", method: "POST", request: async () => ({ path: `/api/projects/${await newProject()}/archive`, body: { version: 1 } }), expect: adminWrite(200) },
  { file: "projects/[projectId]/archive/route.ts", method: "DELETE", request: async () => ({ path: `/api/projects/${await newProject(true)}/archive?version=1` }), expect: adminWrite(200) },
  { file: "projects/[projectId]/schedule/route.ts", method: "GET", request: async () => ({ path: `${await base()}/schedule` }), expect: read },
  { file: "projects/[projectId]/results/route.ts", method: "GET", request: async () => ({ path: `${await base()}/results?case=${(await demoIds()).caseId}` }), expect: read },
  // The draft report: people who work on the schedule; viewers read issued revisions only.
  { file: "projects/[projectId]/report/route.ts", method: "GET", request: async () => ({ path: `${await base()}/report` }), expect: { ...read, viewer: 403 } },
  { file: "projects/[projectId]/export/route.ts", method: "GET", request: async () => ({ path: `${await base()}/export?format=csv&sheet=surfaces` }), expect: read },
  {
    file: "projects/[projectId]/bulk/route.ts",
    method: "POST",
    request: async () => ({ ...(await paidDemoFirm()), path: `${await base()}/bulk`, body: { changes: [{ op: "create", sheet: "surfaces", values: await newValues("surfaces") }] } }),
    expect: write(200),
  },
  {
    file: "projects/[projectId]/import/route.ts",
    method: "POST",
    request: async () => ({
      ...(await paidDemoFirm()),
      path: `${await base()}/import?sheet=surfaces`,
      raw: { type: "text/csv", data: `Label,Zone,Build-up,Area (m²),Tilt (°),Azimuth (°),Centroid height (m),Length along the wind (m),Panel height (m)\n${uniqueRef("Matrix")},Reading room,Brick plinth wall,2,90,0,1,1,1\n` },
    }),
    expect: write(200),
  },
  ...TABLES.flatMap(([path, table, change]): MatrixEntry[] => [
    { file: `projects/[projectId]/${path}/route.ts`, method: "GET", request: async () => ({ path: `${await base()}/${path}` }), expect: read },
    { file: `projects/[projectId]/${path}/route.ts`, method: "POST", request: async () => ({ ...(await paidDemoFirm()), path: `${await base()}/${path}`, body: await newValues(table) }), expect: write(201) },
    { file: `projects/[projectId]/${path}/[itemId]/route.ts`, method: "GET", request: async () => ({ path: `${await base()}/${path}/${await newItem(table)}` }), expect: read },
    { file: `projects/[projectId]/${path}/[itemId]/route.ts`, method: "PATCH", request: async () => ({ path: `${await base()}/${path}/${await newItem(table)}`, body: { version: 1, ...change } }), expect: write(200) },
    { file: `projects/[projectId]/${path}/[itemId]/route.ts`, method: "DELETE", request: async () => ({ path: `${await base()}/${path}/${await newItem(table)}?version=1` }), expect: write(200) },
  ]),
];
