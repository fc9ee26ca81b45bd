// The migrations and the demo seed on the real PostgreSQL: up, seed (twice), down, up again.
import bcrypt from "bcryptjs";
import knexFactory, { type Knex } from "knex";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { DEFAULT_DEMO_PASSWORD, DEMO_USERS } from "../../db/seeds/01_demo_firms";
import { DEMO_CASES, DEMO_DUCT_RUNS, DEMO_SURFACE_COUNT, DEMO_ZONES } from "../../db/seeds/02_demo_schedule";
import { createScratchDatabase, dropScratchDatabase, knexCli } from "../support/database";

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

  test("the demo schedule: at least 3 zones, 40 surfaces on several orientations and heights, 8 duct runs, 3 design cases; a second run adds nothing", async () => {
    const n = async (table: string) => Number((await db(table).count({ n: "*" }))[0]!.n);
    const expected = { zones: DEMO_ZONES.length, surfaces: DEMO_SURFACE_COUNT, duct_runs: DEMO_DUCT_RUNS.length, design_cases: DEMO_CASES.length };
    expect(expected.zones).toBeGreaterThanOrEqual(3);
    expect(expected.surfaces).toBeGreaterThanOrEqual(40);
    expect(expected).toMatchObject({ duct_runs: 8, design_cases: 3 });
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
    const voids = await db("duct_runs").where({ location: "indoor" }).select("T_surround_C", "T_surround_cooling_C");
    expect(voids.length).toBeGreaterThan(0);
    for (const v of voids) expect(v.T_surround_cooling_C).toBeGreaterThan(v.T_surround_C);
    expect(await db("duct_runs").where({ location: "outdoor" }).whereNotNull("T_surround_cooling_C").count({ n: "*" })).toEqual([{ n: "0" }]);
    // Edits made during a demo survive the next start (rows are inserted only when missing).
    await db("zones").where({ name: "Reading room" }).update({ floor_area_m2: 999 });
    expect(cli(["seed:run"]).status).toBe(0);
    expect(await counts()).toEqual(expected);
    expect((await db("zones").where({ name: "Reading room" }).first()).floor_area_m2).toBe(999);
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
