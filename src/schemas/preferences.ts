import { z } from "zod";
import { SHEETS } from "./schedule";
import { UNIT_SYSTEMS } from "@/units/units";
import { columnIds, isBuiltInSet } from "@/schedule/column-sets";
import { MAX_COLUMN_SETS } from "./preferences-defaults";

export { DEFAULT_PREFERENCES, MAX_COLUMN_SETS, type TPreferences } from "./preferences-defaults";

const setId = z
  .string({ error: "Column set id is required" })
  .regex(/^[A-Za-z0-9_-]{1,64}$/, "Column set id is 1–64 letters, digits, _ or -");

export const ZColumnSet = z
  .strictObject({
    id: setId,
    name: z.string({ error: "Name is required" }).trim().min(1, "Name is required").max(60, "Name is at most 60 characters"),
    sheet: z.enum(SHEETS, { error: "Sheet must be surfaces or duct_runs" }),
    columns: z.array(z.string(), { error: "Columns must be a list of column ids" }).min(1, "Pick at least one column").max(100, "At most 100 columns"),
  })
  .superRefine((s, ctx) => {
    const known = new Set(columnIds(s.sheet));
    s.columns.forEach((c, i) => {
      if (!known.has(c)) ctx.addIssue({ code: "custom", path: ["columns", i], message: `No column "${c}" on the ${s.sheet} sheet` });
    });
  });

export const ZPreferencesUpdate = z
  .strictObject({
    /** Optional guard: the version read; a different stored version is a conflict (409). */
    version: z.number({ error: "Version must be a whole number" }).int("Version must be a whole number").min(0, "Version must be 0 or more").optional(),
    unit_system: z.enum(UNIT_SYSTEMS, { error: "Unit system must be SI or IP (or null to follow the project)" }).nullable().optional(),
    zone_totals_collapsed: z.boolean({ error: "Zone totals collapsed must be true or false" }).optional(),
    active_column_sets: z
      .strictObject({ surfaces: setId.optional(), duct_runs: setId.optional() }, { error: "Active column sets must be an object by sheet" })
      .optional(),
    column_sets: z
      .array(ZColumnSet, { error: "Column sets must be a list" })
      .max(MAX_COLUMN_SETS, `At most ${MAX_COLUMN_SETS} column sets`)
      .superRefine((sets, ctx) => {
        const seen = new Set<string>();
        const names = new Set<string>();
        sets.forEach((s, i) => {
          if (isBuiltInSet(s.id)) ctx.addIssue({ code: "custom", path: [i, "id"], message: `Column set id ${s.id} is a built-in set's` });
          if (isBuiltInSet(s.name.trim().toLowerCase())) ctx.addIssue({ code: "custom", path: [i, "name"], message: `"${s.name}" is the name of a built-in set` });
          if (seen.has(s.id)) ctx.addIssue({ code: "custom", path: [i, "id"], message: `Column set id ${s.id} is used twice` });
          const key = `${s.sheet}:${s.name.toLowerCase()}`;
          if (names.has(key)) ctx.addIssue({ code: "custom", path: [i, "name"], message: `There is already a set named "${s.name}" on this sheet` });
          seen.add(s.id);
          names.add(key);
        });
      })
      .optional(),
  });
export type TPreferencesUpdate = z.infer<typeof ZPreferencesUpdate>;
