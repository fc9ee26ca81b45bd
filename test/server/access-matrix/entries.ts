// The expected status of every route handler in app/api for every kind of caller. The test
// checks this list against the route files on disk: a new route (or method) without an entry
// here fails, as does an entry whose route is gone.
import { demoProjectId, freeDemoFirm, newInvitation, newMember, newPasswordReset, newToken, paidDemoFirm, uniqueEmail } from "./fixtures";
import { CHECKING_ENTRIES } from "./checking-entries";
import { SCHEDULE_ENTRIES } from "./schedule-entries";

export const PRINCIPALS = ["anonymous", "admin", "consultant", "checker", "viewer", "other_firm", "admin_token", "revoked_token", "expired_token"] as const;
export type Principal = (typeof PRINCIPALS)[number];
type Method = "GET" | "POST" | "PATCH" | "PUT" | "DELETE";

export interface MatrixEntry {
  /** Route file under app/api, e.g. "projects/[projectId]/route.ts". */
  file: string;
  method: Method;
  /** Builds one request (fresh fixtures each time). */
  request: () => Promise<{ path: string; body?: unknown; form?: Record<string, string>; raw?: { type: string; data: string } }>;
  expect: Record<Principal, number>;
  /** Extra check of what the other firm's member got back: nothing of the demo firm. */
  isolation?: (body: unknown) => void;
}

const same = (status: number): Record<Principal, number> => Object.fromEntries(PRINCIPALS.map((p) => [p, status])) as Record<Principal, number>;
const refusedTokens = { anonymous: 401, revoked_token: 401, expired_token: 401 } as const;
/** Any member or token may; `other` is what the other firm's admin gets (404 for the demo firm's ids). */
const anyMember = (ok: number, other = ok) => ({ ...same(ok), ...refusedTokens, other_firm: other });
/** Firm admins only (sessions and admin tokens); `other` as above. */
const adminOnly = (ok: number, other = ok) => ({ ...same(403), ...refusedTokens, admin: ok, admin_token: ok, other_firm: other });

const noDemoData = (body: unknown) => {
  if (JSON.stringify(body).match(/tarnbrook|TS-2417|demo\.filmsheet\.test/i)) throw new Error(`the other firm saw the demo firm's data: ${JSON.stringify(body)}`);
};

export const ENTRIES: MatrixEntry[] = [
  { file: "health/route.ts", method: "GET", request: async () => ({ path: "/api/health" }), expect: same(200) },
  // Auth.js answers its own endpoints for everyone; a post without its CSRF token is sent back to sign-in.
  { file: "auth/[...nextauth]/route.ts", method: "GET", request: async () => ({ path: "/api/auth/session" }), expect: same(200) },
  { file: "auth/[...nextauth]/route.ts", method: "POST", request: async () => ({ path: "/api/auth/callback/credentials", form: { email: "nobody@example.test", password: "x" } }), expect: same(302) },
  { file: "me/route.ts", method: "GET", request: async () => ({ path: "/api/me" }), expect: anyMember(200), isolation: noDemoData },
  // A made-up confirmation link: 404 for people, 403 for a token (no person to confirm).
  {
    file: "me/email-confirmations/route.ts",
    method: "POST",
    request: async () => ({ path: "/api/me/email-confirmations", body: { token: "x".repeat(43) } }),
    expect: { ...anyMember(404), admin_token: 403 },
  },
  // Signs out the caller's other sessions (each principal here has one); a token is no person.
  { file: "me/sessions/route.ts", method: "DELETE", request: async () => ({ path: "/api/me/sessions" }), expect: { ...anyMember(200), admin_token: 403 } },
  // One's own view settings: a token reads the defaults but, being no person, changes none.
  { file: "me/preferences/route.ts", method: "GET", request: async () => ({ path: "/api/me/preferences" }), expect: anyMember(200), isolation: noDemoData },
  { file: "me/preferences/route.ts", method: "PATCH", request: async () => ({ path: "/api/me/preferences", body: { zone_totals_collapsed: false } }), expect: { ...anyMember(200), admin_token: 403 } },
  {
    file: "calc/route.ts",
    method: "POST",
    request: async () => ({ path: "/api/calc", body: { cases: [{ kind: "dew_point", T_C: 20, RH_pct: 50 }] } }),
    expect: anyMember(200),
  },
  { file: "projects/route.ts", method: "GET", request: async () => ({ path: "/api/projects" }), expect: anyMember(200), isolation: noDemoData },
  {
    file: "projects/route.ts",
    method: "POST",
    // The demo firm is paid here: the matrix is about who may, not about the free plan's one project.
    request: async () => ({ ...(await paidDemoFirm()), path: "/api/projects", body: { name: "Matrix test building", reference: `MX-${Date.now()}-${Math.floor(Math.random() * 1e6)}` } }),
    // Only consultants build projects; no admin here holds that role.
    expect: { ...same(403), ...refusedTokens, consultant: 201 },
  },
  { file: "projects/[projectId]/route.ts", method: "GET", request: async () => ({ path: `/api/projects/${await demoProjectId()}` }), expect: anyMember(200, 404) },
  { file: "firm/members/route.ts", method: "GET", request: async () => ({ path: "/api/firm/members" }), expect: adminOnly(200), isolation: noDemoData },
  {
    file: "firm/members/[userId]/route.ts",
    method: "PATCH",
    request: async () => ({ path: `/api/firm/members/${await newMember()}`, body: { roles: ["checker", "viewer"] } }),
    expect: adminOnly(200, 404),
  },
  { file: "firm/members/[userId]/route.ts", method: "DELETE", request: async () => ({ path: `/api/firm/members/${await newMember()}` }), expect: adminOnly(200, 404) },
  { file: "firm/invitations/route.ts", method: "GET", request: async () => ({ path: "/api/firm/invitations" }), expect: adminOnly(200), isolation: noDemoData },
  { file: "firm/invitations/route.ts", method: "POST", request: async () => ({ path: "/api/firm/invitations", body: { email: uniqueEmail("invite"), roles: ["viewer"] } }), expect: adminOnly(201) },
  { file: "firm/invitations/[invitationId]/route.ts", method: "DELETE", request: async () => ({ path: `/api/firm/invitations/${(await newInvitation()).id}` }), expect: adminOnly(200, 404) },
  {
    file: "firm/invitations/[invitationId]/resend/route.ts",
    method: "POST",
    request: async () => ({ path: `/api/firm/invitations/${(await newInvitation()).id}/resend` }),
    expect: adminOnly(200, 404),
  },
  { file: "firm/tokens/route.ts", method: "GET", request: async () => ({ path: "/api/firm/tokens" }), expect: adminOnly(200), isolation: noDemoData },
  // Only a person makes tokens: an admin token gets 403.
  { file: "firm/tokens/route.ts", method: "POST", request: async () => ({ path: "/api/firm/tokens", body: { name: "matrix", role: "viewer", expiresInDays: 7 } }), expect: { ...adminOnly(201), admin_token: 403 } },
  { file: "firm/tokens/[tokenId]/route.ts", method: "DELETE", request: async () => ({ path: `/api/firm/tokens/${await newToken()}` }), expect: adminOnly(200, 404) },
  { file: "firm/billing/route.ts", method: "GET", request: async () => ({ path: "/api/firm/billing" }), expect: adminOnly(200), isolation: noDemoData },
  // Checkout is for a firm without a subscription; each admin's firm gets a session (never paid).
  { file: "firm/billing/checkout/route.ts", method: "POST", request: async () => ({ ...(await freeDemoFirm()), path: "/api/firm/billing/checkout", body: { seats: 400 } }), expect: adminOnly(201) },
  // Changing seats needs a subscription, which neither demo firm has: admins get through to the 409.
  { file: "firm/billing/seats/route.ts", method: "PUT", request: async () => ({ ...(await freeDemoFirm()), path: "/api/firm/billing/seats", body: { seats: 400 } }), expect: adminOnly(409) },
  { file: "firm/billing/portal/route.ts", method: "POST", request: async () => ({ path: "/api/firm/billing/portal" }), expect: adminOnly(201) },
  // Stripe's webhook needs its signature, whoever sends it; without one: 400 and nothing changes.
  { file: "webhooks/stripe/route.ts", method: "POST", request: async () => ({ path: "/api/webhooks/stripe", body: { id: "evt_matrix", object: "event", type: "customer.subscription.updated" } }), expect: same(400) },
  // Public routes: who calls makes no difference (a bad token is not even looked at).
  {
    file: "sign-up/route.ts",
    method: "POST",
    request: async () => ({ path: "/api/sign-up", body: { firmName: "Matrix Partners", name: "M. Atrix", email: uniqueEmail("founder"), password: "matrix-password-1" } }),
    expect: same(201),
  },
  {
    file: "invitations/accept/route.ts",
    method: "POST",
    request: async () => ({ path: "/api/invitations/accept", body: { token: (await newInvitation()).secret, name: "New Person", password: "new-person-password" } }),
    expect: same(200),
  },
  { file: "password-resets/route.ts", method: "POST", request: async () => ({ path: "/api/password-resets", body: { email: uniqueEmail("forgetful") } }), expect: same(202) },
  {
    file: "password-resets/confirm/route.ts",
    method: "POST",
    request: async () => ({ path: "/api/password-resets/confirm", body: { token: await newPasswordReset(), password: "a-fresh-password" } }),
    expect: same(200),
  },
  ...SCHEDULE_ENTRIES,
  ...CHECKING_ENTRIES,
];
