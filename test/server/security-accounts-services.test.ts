// Issue 12, accounts, at the service level: bcrypt runs only for input that can succeed (a taken
// address at sign-up, a made-up or used reset link cost no hashing), and the hourly prune clears
// sign-in links and records that can no longer do anything. Real PostgreSQL.
import { randomBytes } from "node:crypto";
import { afterAll, describe, expect, test, vi } from "vitest";
import { closeTestDb, testDb } from "../support/db";

// Counts the hashes actually computed; the real bcrypt still runs.
const hashes = vi.hoisted(() => ({ count: 0 }));
vi.mock("@/server/auth/password", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/server/auth/password")>();
  return { ...real, hashPassword: async (password: string) => (hashes.count++, real.hashPassword(password)) };
});

const { db } = await import("@/server/db/knex");
const { signUpFirm } = await import("@/server/services/sign-up-firm");
const { resetPassword } = await import("@/server/services/reset-password");
const { pruneAuthRecords } = await import("@/server/jobs/prune-auth-records");

const run = `${process.pid}-${Date.now()}`;

afterAll(async () => {
  await db().destroy();
  await closeTestDb();
});

describe("bcrypt only after the cheap checks", () => {
  test("signing up with a taken address is refused without hashing the password", async () => {
    const input = { firmName: "Cheap Checks", name: "Che", email: `cheap-${run}@services.test`, password: "cheap-password-1" };
    await signUpFirm(input);
    expect(hashes.count).toBe(1);
    await expect(signUpFirm({ ...input, firmName: "Second Try" })).rejects.toMatchObject({ code: "conflict" });
    expect(hashes.count).toBe(1);
  });

  test("a made-up, used or expired reset link is refused without hashing", async () => {
    const before = hashes.count;
    await expect(resetPassword({ token: randomBytes(32).toString("base64url"), password: "never-hashed-1" })).rejects.toMatchObject({ code: "not_found" });
    const user = await testDb()("users").where({ email: `cheap-${run}@services.test` }).first("id");
    const used = randomBytes(32).toString("base64url");
    const { hashSecret } = await import("@/server/auth/secrets");
    await testDb()("password_resets").insert([
      { user_id: user.id, token_hash: hashSecret(used), expires_at: new Date(Date.now() + 3_600_000), used_at: new Date() },
    ]);
    await expect(resetPassword({ token: used, password: "never-hashed-2" })).rejects.toMatchObject({ code: "gone" });
    expect(hashes.count).toBe(before);
  });
});

describe("pruning", () => {
  test("expired sign-in links, reset links, link requests and dead sessions go; live ones stay", async () => {
    const user = await testDb()("users").where({ email: `cheap-${run}@services.test` }).first("id");
    const long = new Date(Date.now() - 3 * 86_400_000);
    const soon = new Date(Date.now() + 600_000);
    const tag = `prune-${run}`;
    await testDb()("verification_token").insert([
      { identifier: `old-${tag}@services.test`, token: randomBytes(16).toString("hex"), expires: long },
      { identifier: `live-${tag}@services.test`, token: randomBytes(16).toString("hex"), expires: soon },
    ]);
    await testDb()("password_resets").insert({ user_id: user.id, token_hash: randomBytes(32).toString("hex"), expires_at: long });
    await testDb()("magic_link_requests").insert([
      { email: `old-${tag}@services.test`, address: "10.0.0.1", created_at: long },
      { email: `live-${tag}@services.test`, address: "10.0.0.1" },
    ]);
    const [dead] = await testDb()("user_sessions").insert({ user_id: user.id, expires_at: soon, revoked_at: long }).returning("id");
    const [live] = await testDb()("user_sessions").insert({ user_id: user.id, expires_at: soon }).returning("id");

    const pruned = await pruneAuthRecords();
    expect(pruned.verificationTokens).toBeGreaterThanOrEqual(1);
    expect((await testDb()("verification_token").where("identifier", "like", `%${tag}%`).pluck("identifier")).sort()).toEqual([`live-${tag}@services.test`]);
    expect(await testDb()("password_resets").where({ user_id: user.id }).where("expires_at", "<", new Date()).first()).toBeUndefined();
    expect(await testDb()("magic_link_requests").where("email", "like", `%${tag}%`).pluck("email")).toEqual([`live-${tag}@services.test`]);
    expect(await testDb()("user_sessions").whereIn("id", [dead.id, live.id]).pluck("id")).toEqual([live.id]);
  });
});
