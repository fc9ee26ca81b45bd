// The migrations and the demo seed on the real PostgreSQL: up, seed (twice), down, up again.
import bcrypt from "bcryptjs";
import knexFactory, { type Knex } from "knex";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { DEFAULT_DEMO_PASSWORD, DEMO_USERS } from "../../db/seeds/01_demo_firms";
import { createScratchDatabase, dropScratchDatabase, knexCli } from "../support/database";

const NAME = "filmsheet_test_migrations";
const TABLES = [
  "accounts",
  "api_tokens",
  "firm_billing",
  "firms",
  "invitations",
  "memberships",
  "password_resets",
  "projects",
  "sessions",
  "sign_in_attempts",
  "users",
  "verification_token",
  "webhook_events",
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
