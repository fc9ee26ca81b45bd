// The last acceptance of each row, kept when the row goes back to unchecked: who accepted it and
// when, at which row version, whether in bulk (from the check view's list), and the inputs its
// results were computed from then — the row, its zone, its build-up, every design case and the
// site — so the row's working can say what changed since (before → after).
//
// Rows accepted today get their acceptance from what is stored now: an accepted row has not
// changed since it was accepted (any change sends it back to unchecked), so its inputs now are
// its inputs then. Rows already sent back have no record of them; their working says so.
import type { Knex } from "knex";

const BOOKKEEPING = ["version", "position", "created_at", "updated_at", "firm_id", "project_id"].map((k) => ` - '${k}'`).join("");

export const backfillAcceptances = (sheet: "surfaces" | "duct_runs") => `
UPDATE row_checks c SET
  accepted_at = c.checked_at,
  accepted_by = c.checked_by,
  accepted_row_version = c.checked_row_version,
  accepted_inputs = jsonb_build_object(
    'format', 1,
    'row', to_jsonb(r)${BOOKKEEPING},
    'zone', (SELECT to_jsonb(z)${BOOKKEEPING} FROM zones z WHERE z.id = r.zone_id),
    'buildup', ${
      sheet === "surfaces"
        ? `(SELECT (to_jsonb(b)${BOOKKEEPING}) || jsonb_build_object('layers', coalesce((
              SELECT jsonb_agg(jsonb_build_object('material', l.material, 'thickness_m', l.thickness_m, 'k_W_mK', l."k_W_mK") ORDER BY l.position)
                FROM buildup_layers l WHERE l.buildup_id = b.id), '[]'::jsonb))
            FROM buildups b WHERE b.id = r.buildup_id)`
        : "null::jsonb"
    },
    'design_cases', coalesce((SELECT jsonb_agg(to_jsonb(d)${BOOKKEEPING} ORDER BY d.name) FROM design_cases d WHERE d.project_id = c.project_id), '[]'::jsonb),
    'site', (SELECT jsonb_build_object('altitude_m', p.altitude_m, 'terrain', p.terrain, 'wind_law', p.wind_law, 'default_method', p.default_method) FROM projects p WHERE p.id = c.project_id)
  )
FROM ${sheet} r
WHERE c.sheet = '${sheet}' AND c.row_id = r.id AND c.state = 'accepted'`;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("row_checks", (t) => {
    t.timestamp("accepted_at", { useTz: true });
    t.integer("accepted_by").references("users.id").onDelete("SET NULL");
    t.integer("accepted_row_version");
    // Accepted with others from the check view's list (the audit row names the filter and count).
    t.boolean("accepted_in_bulk").notNullable().defaultTo(false);
    t.jsonb("accepted_inputs");
  });
  await knex.raw(backfillAcceptances("surfaces"));
  await knex.raw(backfillAcceptances("duct_runs"));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("row_checks", (t) => {
    t.dropColumn("accepted_inputs");
    t.dropColumn("accepted_in_bulk");
    t.dropColumn("accepted_row_version");
    t.dropColumn("accepted_by");
    t.dropColumn("accepted_at");
  });
}
