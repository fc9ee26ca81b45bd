import { z } from "zod";
import { ZSheet, ZVersion } from "./schedule";

const values = z.record(z.string(), z.unknown(), { error: "values must be an object of fields" });

/** One change of a row of the Surfaces or Duct runs sheet. */
export const ZBulkChange = z.discriminatedUnion(
  "op",
  [
    z.strictObject({ op: z.literal("create"), sheet: ZSheet, id: z.uuid({ error: "id must be a UUID" }).optional(), values }),
    z.strictObject({ op: z.literal("update"), sheet: ZSheet, id: z.uuid({ error: "id must be a UUID" }), version: ZVersion, values }),
    z.strictObject({ op: z.literal("delete"), sheet: ZSheet, id: z.uuid({ error: "id must be a UUID" }), version: ZVersion }),
  ],
  { error: "op must be create, update or delete" },
);
export type TBulkChange = z.infer<typeof ZBulkChange>;

export const BULK_MAX_CHANGES = 20_000;
export const ZBulkBody = z.strictObject({
  changes: z
    .array(ZBulkChange, { error: "changes must be a list" })
    .min(1, "changes must hold at least one change")
    .max(BULK_MAX_CHANGES, `At most ${BULK_MAX_CHANGES} changes at once`),
});
export type TBulkBody = z.infer<typeof ZBulkBody>;
