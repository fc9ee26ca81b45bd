// Rows the access matrix acts on, made fresh for each cell so that one principal's successful
// DELETE or PATCH never leaves the next one nothing to act on.
import { createHash, randomBytes } from "node:crypto";
import { clearPlan, grantPaidPlan } from "../../support/billing";
import { testDb } from "../../support/db";

export const DEMO_FIRM = "tarnbrook-sill";
export const OTHER_FIRM = "ostrander-mechanical";

let serial = 0;
/** An address no other test uses. */
export const uniqueEmail = (what: string) => `${what}-${process.pid}-${Date.now()}-${++serial}@matrix.filmsheet.test`;
const hash = (s: string) => createHash("sha256").update(s).digest("hex");

export async function firmId(slug: string): Promise<string> {
  const firm = await testDb()("firms").where({ slug }).first("id");
  if (!firm) throw new Error(`No firm ${slug}`);
  return firm.id;
}

/** A member of the demo firm (viewer), for the role-change and removal routes. */
export async function newMember(): Promise<number> {
  const [user] = await testDb()("users").insert({ email: uniqueEmail("member"), name: "Matrix member" }).returning("id");
  await testDb()("memberships").insert({ firm_id: await firmId(DEMO_FIRM), user_id: user.id, role: "viewer" });
  return user.id;
}

/** A pending invitation of the demo firm; returns its id and the secret of its link. */
export async function newInvitation(): Promise<{ id: string; secret: string }> {
  const secret = randomBytes(32).toString("base64url");
  const [row] = await testDb()("invitations")
    .insert({ firm_id: await firmId(DEMO_FIRM), email: uniqueEmail("invitee"), roles: ["viewer"], token_hash: hash(secret), expires_at: new Date(Date.now() + 86_400_000) })
    .returning("id");
  return { id: row.id, secret };
}

/** An active API token of the demo firm, to be revoked. */
export async function newToken(): Promise<string> {
  const [row] = await testDb()("api_tokens")
    .insert({ firm_id: await firmId(DEMO_FIRM), name: "matrix", role: "viewer", token_hash: hash(randomBytes(16).toString("hex")), prefix: "fst_matrix", expires_at: new Date(Date.now() + 86_400_000) })
    .returning("id");
  return row.id;
}

/** A password-reset link for a fresh account; returns the secret. */
export async function newPasswordReset(): Promise<string> {
  const secret = randomBytes(32).toString("base64url");
  const [user] = await testDb()("users").insert({ email: uniqueEmail("resetter") }).returning("id");
  await testDb()("password_resets").insert({ user_id: user.id, token_hash: hash(secret), expires_at: new Date(Date.now() + 3_600_000) });
  return secret;
}

export async function demoProjectId(): Promise<string> {
  const row = await testDb()("projects").where({ firm_id: await firmId(DEMO_FIRM), reference: "TS-2417" }).first("id");
  return row.id;
}

/** The demo firm on the paid plan, for entries that go beyond the free limits (returns nothing to spread). */
export async function paidDemoFirm(): Promise<Record<string, never>> {
  await grantPaidPlan(await firmId(DEMO_FIRM));
  return {};
}

/** The demo firm with no subscription (and no Stripe customer), for the Checkout entries. */
export async function freeDemoFirm(): Promise<Record<string, never>> {
  await clearPlan(await firmId(DEMO_FIRM));
  return {};
}
