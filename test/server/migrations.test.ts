// The migrations and the demo seed on the real PostgreSQL: up, seed (twice), down, up again.
import bcrypt from "bcryptjs";
import knexFactory, { type Knex } from "knex";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { DEFAULT_DEMO_PASSWORD, DEMO_USERS } from "../../db/seeds/01_demo_firms";
import { DEMO_CASES, DEMO_DUCT_RUNS, DEMO_SURFACE_COUNT, DEMO_ZONES } from "../../db/seeds/02_demo_schedule";
import { createScratchDatabase, dropScratchDatabase, knexCli } from "../support/database";
import { resultsFor } from "../../src/schedule/engine-schedule";
import type { TSchedule } from "../../src/schemas/schedule";

const NAME = "filmsheet_test_migrations";
const TABLES = [
  "accounts",
  "api_tokens",
  "audit_log",
  "buildup_layers",
  "buildups",
  "deployment_marks",
  "design_cases",
  "duct_runs",
  "email_confirmations",
  "firm_billing",
  "firms",
  "invitations",
  "magic_link_requests",
  "memberships",
  "notification_mutes",
  "password_resets",
  "projects",
  "report_builds",
  "revision_reports",
  "revisions",
  "row_checks",
  "row_comments",
  "sessions",
  "sign_in_attempts",
  "surfaces",
  "user_preferences",
  "user_sessions",
  "users",
  "verification_token",
  "webhook_events",
  "zones",
];
let url: string;
let db: Knex;

const tablesPresent = async () => {
  const { rows } = await db.raw<{ rows: { table_name: string }[] }>(
    "select table_name from information_schema.tables where table_schema = 'public' and table_name = any(?) order by table_name",
    [TABLES],
  );
  return rows.map((r) => r.table_name);
};
const counts = async () => ({
  firms: Number((await db("firms").count({ n: "*" }))[0]!.n),
  users: Number((await db("users").count({ n: "*" }))[0]!.n),
  memberships: Number((await db("memberships").count({ n: "*" }))[0]!.n),
  projects: Number((await db("projects").count({ n: "*" }))[0]!.n),
});
const cli = (args: string[], extra: Record<string, string> = {}) => knexCli(args, { DATABASE_URL: url, NODE_ENV: "test", DEMO_PASSWORD: "", ...extra });

beforeAll(async () => {
  url = await createScratchDatabase(NAME);
  db = knexFactory({ client: "pg", connection: url, pool: { min: 0, max: 2 } });
});
afterAll(async () => {
  await db?.destroy();
  await dropScratchDatabase(NAME);
});

describe("migrations round trip", () => {
  test("migrate:latest creates the firm, user, Auth.js, access, project and billing tables", async () => {
    const r = cli(["migrate:latest"]);
    expect(r.status, r.output).toBe(0);
    expect(await tablesPresent()).toEqual(TABLES);
  });

  test("the demo seed loads two firms, five users, one membership each and a project per firm, and is idempotent", async () => {
    for (let run = 1; run <= 2; run++) {
      const r = cli(["seed:run"]);
      expect(r.status, `seed run ${run}: ${r.output}`).toBe(0);
      expect(await counts()).toEqual({ firms: 2, users: DEMO_USERS.length, memberships: DEMO_USERS.length, projects: 2 });
    }
    const projects = await db("projects as p").join("firms as f", "f.id", "p.firm_id").select("f.slug", "p.reference").orderBy("f.slug");
    expect(projects).toEqual([
      { slug: "ostrander-mechanical", reference: "OMD-0982" },
      { slug: "tarnbrook-sill", reference: "TS-2417" },
    ]);
    const roles = await db("memberships as m")
      .join("users as u", "u.id", "m.user_id")
      .join("firms as f", "f.id", "m.firm_id")
      .select("u.email", "m.role", "f.slug")
      .orderBy("u.email");
    expect(roles).toContainEqual({ email: "checker@demo.filmsheet.test", role: "checker", slug: "tarnbrook-sill" });
    expect(roles).toContainEqual({ email: "admin@other.filmsheet.test", role: "admin", slug: "ostrander-mechanical" });
  });

  test("the demo schedule: at least 3 zones, 40 surfaces on several orientations and heights, 9 duct runs, 4 design cases; a second run adds nothing", async () => {
    const n = async (table: string) => Number((await db(table).count({ n: "*" }))[0]!.n);
    const expected = { zones: DEMO_ZONES.length, surfaces: DEMO_SURFACE_COUNT, duct_runs: DEMO_DUCT_RUNS.length, design_cases: DEMO_CASES.length };
    expect(expected.zones).toBeGreaterThanOrEqual(3);
    expect(expected.surfaces).toBeGreaterThanOrEqual(40);
    expect(expected).toMatchObject({ duct_runs: 9, design_cases: 4 });
    const counts = async () => ({ zones: await n("zones"), surfaces: await n("surfaces"), duct_runs: await n("duct_runs"), design_cases: await n("design_cases") });
    expect(await counts()).toEqual(expected);
    const orientations = await db("surfaces").where({ tilt_deg: 90 }).distinct("azimuth_deg");
    const heights = await db("surfaces").distinct("height_m");
    expect(orientations.length).toBeGreaterThanOrEqual(4);
    expect(heights.length).toBeGreaterThanOrEqual(5);
    expect(await db("duct_runs").where({ location: "outdoor" }).count({ n: "*" })).not.toEqual([{ n: "0" }]);
    expect(await db("duct_runs").where({ location: "indoor" }).whereNotNull("T_surround_C").count({ n: "*" })).not.toEqual([{ n: "0" }]);
    // Ceiling voids are warmer in summer: the seed's void runs carry a cooling surround above their
    // heating one, the roof runs leave both blank (the outdoor air).
    const voids = await db("duct_runs").where({ location: "indoor", in_served_zone: false }).select("T_surround_C", "T_surround_cooling_C");
    expect(voids.length).toBeGreaterThan(0);
    for (const v of voids) expect(v.T_surround_cooling_C).toBeGreaterThan(v.T_surround_C);
    expect(await db("duct_runs").where({ location: "outdoor" }).whereNotNull("T_surround_cooling_C").count({ n: "*" })).toEqual([{ n: "0" }]);
    // The v2 inputs: clear and overcast skies, a surface over the ground, a run inside the zone it
    // serves (its surrounds blank: it crosses that zone's air), roof runs with a jacket absorptance.
    expect((await db("design_cases").orderBy("cloud_cover").pluck("cloud_cover")).map(Number)).toEqual([0, 0, 0.2, 0.8]);
    expect(await db("surfaces").where({ exposed_to: "ground" }).pluck("label")).toEqual(["RR ground-floor slab"]);
    expect(await db("duct_runs").where({ in_served_zone: true }).select("location", "T_surround_C", "T_surround_cooling_C")).toEqual([{ location: "indoor", T_surround_C: null, T_surround_cooling_C: null }]);
    expect(await db("duct_runs").where({ location: "outdoor" }).whereNotNull("jacket_absorptance").count({ n: "*" })).not.toEqual([{ n: "0" }]);
    // Edits made during a demo survive the next start (rows are inserted only when missing).
    await db("zones").where({ name: "Reading room" }).update({ floor_area_m2: 999 });
    expect(cli(["seed:run"]).status).toBe(0);
    expect(await counts()).toEqual(expected);
    expect((await db("zones").where({ name: "Reading room" }).first()).floor_area_m2).toBe(999);
  });

  test("the demo shows what contract v2 flags, as the engine computes it", async () => {
    const project = await db("projects").where({ reference: "TS-2417" }).first();
    const of = (t: string) => db(t).where({ project_id: project.id });
    const buildups = await of("buildups");
    for (const b of buildups) b.layers = await db("buildup_layers").where({ buildup_id: b.id }).orderBy("position").select("material", "thickness_m", "k_W_mK");
    const s = { project, design_cases: await of("design_cases"), zones: await of("zones"), buildups, surfaces: await of("surfaces").orderBy("position"), duct_runs: await of("duct_runs").orderBy("position") } as unknown as TSchedule;
    const run = (name: string) => resultsFor(s, s.design_cases.find((d) => d.name === name)!);
    const label = (id: string) => [...s.surfaces, ...s.duct_runs].find((r) => r.id === id)!.label;
    const winter = run("Winter design day, windy");
    const summer = run("Summer design day, sunny");
    // Mould and condensation on the inside of the retained single pane in winter, nowhere else.
    expect(winter.surfaces.filter((r) => r.inside?.mould_risk).map((r) => label(r.row_id))).toEqual(["EL retained spandrel"]);
    // The slab over the ground is not computed in any case.
    for (const r of [winter, summer]) expect(r.surfaces.filter((x) => !x.result.ok).map((x) => [label(x.row_id), (x.result as { error: { code: string } }).error.code])).toEqual([["RR ground-floor slab", "not_computed"]]);
    // The sunlit flat roofs are method-sensitive in summer.
    const roofs = summer.surfaces.filter((r) => /roof/.test(label(r.row_id)));
    expect(roofs.length).toBeGreaterThan(0);
    for (const r of roofs) expect(r.spread?.sensitive, label(r.row_id)).toBe(true);
    // The spiral duct inside the reading room gives its heat to the room: reported on its own.
    const rr = winter.zones.find((z) => z.name === "Reading room")!;
    expect(rr.ducts_in_zone_W).toBeGreaterThan(0);
    // Cloud warms the sky: the same roof run loses less heat under the overcast case's 0.8 than a
    // clear sky would give it on that day.
    const overcast = s.design_cases.find((d) => d.name === "Winter overcast day, mild")!;
    const roofRun = s.duct_runs.find((d) => d.label === "AHU-1 supply, roof run to gallery drop")!.id;
    const q = (dc: typeof overcast) => (resultsFor(s, dc).duct_runs.find((d) => d.row_id === roofRun)!.result as unknown as { Q_W: number }).Q_W;
    expect(overcast.cloud_cover).toBe(0.8);
    expect(q(overcast)).toBeGreaterThan(q({ ...overcast, cloud_cover: 0 }));
  });

  test("a surface cannot point at another project's zone, nor sit in another firm's project", async () => {
    const [a, b] = await db("projects").orderBy("reference").select("id", "firm_id");
    const zone = await db("zones").first();
    const other = a!.id === zone.project_id ? b! : a!;
    const buildup = await db("buildups").where({ project_id: zone.project_id }).first();
    const row = { label: "x", area_m2: 1, tilt_deg: 90, azimuth_deg: 0, height_m: 1, length_m: 1, panel_height_m: 1, position: 0 };
    await expect(db("surfaces").insert({ ...row, firm_id: other.firm_id, project_id: other.id, zone_id: zone.id, buildup_id: buildup.id })).rejects.toThrow(/foreign key/);
    await expect(db("surfaces").insert({ ...row, firm_id: other.firm_id, project_id: zone.project_id, zone_id: zone.id, buildup_id: buildup.id })).rejects.toThrow(/project_firm_fk/);
  });

  test("demo passwords are bcrypt hashes of the default DEMO_PASSWORD", async () => {
    const user = await db("users").where({ email: "consultant@demo.filmsheet.test" }).first();
    expect(user.password_hash).toMatch(/^\$2[aby]\$10\$/);
    expect(await bcrypt.compare(DEFAULT_DEMO_PASSWORD, user.password_hash)).toBe(true);
  });

  test("the seed refuses to run with NODE_ENV=production", () => {
    const r = cli(["seed:run"], { NODE_ENV: "production" });
    expect(r.status).not.toBe(0);
    expect(r.output).toContain("Refusing to load demo data");
  });

  test("the seed refuses whenever the app will serve in production: a public APP_URL or database, whatever NODE_ENV says", () => {
    const publicUrl = cli(["seed:run"], { APP_URL: "https://filmsheet.example.com" });
    expect(publicUrl.status).not.toBe(0);
    expect(publicUrl.output).toContain("Refusing to load demo data: APP_URL (https://filmsheet.example.com) is not on this machine");
    const remoteDb = knexCli(["seed:run"], { DATABASE_URL: url.replace("127.0.0.1", "db.example.invalid"), NODE_ENV: "test", DEMO_PASSWORD: "" });
    expect(remoteDb.status).not.toBe(0);
    expect(remoteDb.output).toContain("Refusing to load demo data: DATABASE_URL points at db.example.invalid");
  });

  test("the seed refuses a database the app has served in production (the mark it leaves), and runs again once the mark is gone", async () => {
    await db("deployment_marks").insert({ mode: "production", app_url: "https://filmsheet.example.com" });
    const marked = cli(["seed:run"]);
    expect(marked.status).not.toBe(0);
    expect(marked.output).toContain("Refusing to load demo data: the app has served this database in production at https://filmsheet.example.com");
    await db("deployment_marks").delete();
    expect(cli(["seed:run"]).status).toBe(0);
  });

  test("an invitation with an unknown role, or a firm with no seats, is rejected by the database", async () => {
    const firm = await db("firms").first();
    await expect(
      db("invitations").insert({ firm_id: firm.id, email: "x@example.test", roles: ["owner"], token_hash: "h1", expires_at: new Date() }),
    ).rejects.toThrow(/invitations_roles_known/);
    await expect(db("firms").where({ id: firm.id }).update({ seats: 0 })).rejects.toThrow(/firms_seats_positive/);
  });

  test("a membership role outside admin/consultant/checker/viewer is rejected by the database", async () => {
    const user = await db("users").first();
    const firm = await db("firms").first();
    await expect(db("memberships").insert({ firm_id: firm.id, user_id: user.id, role: "owner" })).rejects.toThrow(/membership_role|check constraint/);
  });

  test("duct_runs.T_surround_cooling_C is a nullable double; rolling back its migration drops only that column, with the rows", async () => {
    const column = () =>
      db("information_schema.columns").where({ table_schema: "public", table_name: "duct_runs", column_name: "T_surround_cooling_C" }).first("data_type", "is_nullable");
    expect(await column()).toEqual({ data_type: "double precision", is_nullable: "YES" });
    const rows = Number((await db("duct_runs").count({ n: "*" }))[0]!.n);
    const down = cli(["migrate:down", "20261207000000_duct_surround_cooling.ts"]);
    expect(down.status, down.output).toBe(0);
    expect(await column()).toBeUndefined();
    expect(Number((await db("duct_runs").count({ n: "*" }))[0]!.n)).toBe(rows);
    const up = cli(["migrate:latest"]);
    expect(up.status, up.output).toBe(0);
    expect(await column()).toEqual({ data_type: "double precision", is_nullable: "YES" });
  });

  test("the v2 inputs: typed columns with defaults for the rows already stored, refused out of range by the database, and an exact down()", async () => {
    const cols = async () =>
      db("information_schema.columns")
        .where({ table_schema: "public" })
        .whereIn(["table_name", "column_name"], [["design_cases", "cloud_cover"], ["surfaces", "exposed_to"], ["duct_runs", "in_served_zone"], ["duct_runs", "jacket_absorptance"]])
        .orderBy(["table_name", "column_name"])
        .select("table_name", "column_name", "data_type", "is_nullable", "column_default");
    const expected = [
      { table_name: "design_cases", column_name: "cloud_cover", data_type: "double precision", is_nullable: "NO", column_default: "'0'::double precision" },
      { table_name: "duct_runs", column_name: "in_served_zone", data_type: "boolean", is_nullable: "NO", column_default: "false" },
      { table_name: "duct_runs", column_name: "jacket_absorptance", data_type: "double precision", is_nullable: "YES", column_default: null },
      { table_name: "surfaces", column_name: "exposed_to", data_type: "text", is_nullable: "NO", column_default: "'outside_air'::text" },
    ];
    expect(await cols()).toEqual(expected);
    const dc = await db("design_cases").first("id");
    const surface = await db("surfaces").first("id");
    const duct = await db("duct_runs").first("id");
    await expect(db("design_cases").where(dc).update({ cloud_cover: 1.01 })).rejects.toThrow(/design_cases_cloud_cover_fraction/);
    await expect(db("design_cases").where(dc).update({ cloud_cover: -0.1 })).rejects.toThrow(/design_cases_cloud_cover_fraction/);
    await expect(db("surfaces").where(surface).update({ exposed_to: "water" })).rejects.toThrow(/surfaces_exposed_to_known/);
    await expect(db("duct_runs").where(duct).update({ jacket_absorptance: 1.5 })).rejects.toThrow(/duct_runs_jacket_absorptance_fraction/);
    await expect(db("duct_runs").where(duct).update({ in_served_zone: null })).rejects.toThrow(/not-null|null value/);

    const before = { surfaces: await db("surfaces").count({ n: "*" }), duct_runs: await db("duct_runs").count({ n: "*" }) };
    const down = cli(["migrate:down", "20261213000000_engine_v2_inputs.ts"]);
    expect(down.status, down.output).toBe(0);
    expect(await cols()).toEqual([]);
    const { rows: checks } = await db.raw<{ rows: unknown[] }>("select conname from pg_constraint where conname in ('design_cases_cloud_cover_fraction', 'surfaces_exposed_to_known', 'duct_runs_jacket_absorptance_fraction')");
    expect(checks).toEqual([]);
    expect({ surfaces: await db("surfaces").count({ n: "*" }), duct_runs: await db("duct_runs").count({ n: "*" }) }).toEqual(before);
    // Up again on rows written without the columns: each takes its default.
    const up = cli(["migrate:latest"]);
    expect(up.status, up.output).toBe(0);
    expect(await cols()).toEqual(expected);
    expect(await db("surfaces").whereNot({ exposed_to: "outside_air" }).count({ n: "*" })).toEqual([{ n: "0" }]);
    expect(await db("design_cases").whereNot({ cloud_cover: 0 }).count({ n: "*" })).toEqual([{ n: "0" }]);
  });

  test("migrate:rollback --all drops every table, migrate:latest brings them back", async () => {
    const down = cli(["migrate:rollback", "--all"]);
    expect(down.status, down.output).toBe(0);
    expect(await tablesPresent()).toEqual([]);
    const up = cli(["migrate:latest"]);
    expect(up.status, up.output).toBe(0);
    expect(await tablesPresent()).toEqual(TABLES);
    expect(await counts()).toEqual({ firms: 0, users: 0, memberships: 0, projects: 0 });
  });
});
