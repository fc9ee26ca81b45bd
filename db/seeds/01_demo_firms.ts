// Demo data for development and tests: an invented consultancy with one member per role, and a
// second, unrelated firm to prove tenant isolation. Idempotent: safe on every `npm start`.
import bcrypt from "bcryptjs";
import type { Knex } from "knex";
import { assertDemoSeedAllowed } from "../demo-seed-guard";

export const DEFAULT_DEMO_PASSWORD = "filmsheet-demo";

export const DEMO_FIRMS = [
  { slug: "tarnbrook-sill", name: "Tarnbrook & Sill Building Services" },
  { slug: "ostrander-mechanical", name: "Ostrander Mechanical Design" },
] as const;

export const DEMO_USERS = [
  { email: "admin@demo.filmsheet.test", name: "Maren Tarnbrook", firm: "tarnbrook-sill", roles: ["admin"] },
  { email: "consultant@demo.filmsheet.test", name: "Idris Okonkwo-Hale", firm: "tarnbrook-sill", roles: ["consultant"] },
  { email: "checker@demo.filmsheet.test", name: "Solveig Prynne", firm: "tarnbrook-sill", roles: ["checker"] },
  { email: "viewer@demo.filmsheet.test", name: "Teodor Vance (architect)", firm: "tarnbrook-sill", roles: ["viewer"] },
  { email: "admin@other.filmsheet.test", name: "Priya Ostrander", firm: "ostrander-mechanical", roles: ["admin"] },
] as const;

/** The invented building Tarnbrook & Sill's demo project describes. */
export const DEMO_BUILDING = {
  name: "Larchfield Community Library, extension",
  site: "Larchfield, on an exposed ridge at 212 m above sea level",
  altitude_m: 212,
  terrain: "open country with scattered hedges",
  summary:
    "Two-storey timber-frame extension: a rainscreen-clad reading room, a flat roof with a rooftop air-handling unit, and supply ducts running across the roof to the plant room.",
} as const;

/** One project per firm, so that each firm sees its own and never the other's. */
export const DEMO_PROJECTS = [
  { firm: "tarnbrook-sill", reference: "TS-2417", name: DEMO_BUILDING.name },
  { firm: "ostrander-mechanical", reference: "OMD-0982", name: "Pellworth Ferry Terminal, waiting hall" },
] as const;

export async function seed(knex: Knex): Promise<void> {
  // Never where the app serves (or will serve) in production: see db/demo-seed-guard.ts.
  await assertDemoSeedAllowed(knex);
  const password = process.env.DEMO_PASSWORD || DEFAULT_DEMO_PASSWORD;
  const passwordHash = await bcrypt.hash(password, 10);

  await knex.transaction(async (trx) => {
    const firmIds = new Map<string, string>();
    for (const firm of DEMO_FIRMS) {
      const [row] = await trx("firms")
        .insert(firm)
        .onConflict("slug")
        .merge({ name: firm.name, updated_at: trx.fn.now() })
        .returning(["id"]);
      firmIds.set(firm.slug, row.id);
    }

    for (const user of DEMO_USERS) {
      const [row] = await trx("users")
        .insert({ email: user.email, name: user.name, password_hash: passwordHash, emailVerified: trx.fn.now() })
        .onConflict("email")
        .merge({ name: user.name, password_hash: passwordHash, updated_at: trx.fn.now() })
        .returning(["id"]);
      const memberships = user.roles.map((role) => ({ firm_id: firmIds.get(user.firm), user_id: row.id, role }));
      await trx("memberships").insert(memberships).onConflict(["firm_id", "user_id", "role"]).ignore();
    }

    for (const project of DEMO_PROJECTS) {
      await trx("projects")
        .insert({ firm_id: firmIds.get(project.firm), reference: project.reference, name: project.name })
        .onConflict(["firm_id", "reference"])
        .ignore();
    }
  });
}
