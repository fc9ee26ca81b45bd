import { z } from "zod";
import { CHECK_STATES, CHECK_SHEETS } from "@/checking/check-machine";

const text = (label: string, max: number) => z.string({ error: `${label} must be text` }).trim().max(max, `${label} is at most ${max} characters`);

/** The version of the row the checker read; a row changed since then cannot be checked (409). */
const ZRowVersion = z.coerce
  .number({ error: "row_version is required (the version of the row you read)" })
  .int("row_version must be a whole number")
  .positive("row_version must be a positive whole number");

export const ZCheckMove = z
  .object({
    move: z.enum(["accept", "query"], { error: "move must be accept or query" }),
    row_version: ZRowVersion,
    comment: text("Comment", 4000).optional(),
  })
  .superRefine((v, ctx) => {
    if (v.move === "query" && !v.comment) ctx.addIssue({ code: "custom", path: ["comment"], message: "A query needs a comment saying what to look at" });
  });
export type TCheckMoveInput = z.infer<typeof ZCheckMove>;

export const ZRowComment = z.object({
  body: text("Comment", 4000).min(1, "Write a comment first"),
  row_version: ZRowVersion.optional(),
});
export type TRowCommentInput = z.infer<typeof ZRowComment>;

export const ZCheckRequest = z.object({ message: text("Message", 2000).optional() });
export const ZIssueRevision = z.object({ note: text("Note", 2000).optional() });
export const ZNotificationMute = z.object({
  // A form's checkbox sends "on" or nothing; JSON sends a boolean.
  muted: z.union([z.boolean(), z.enum(["true", "false", "on", "off"]).transform((s) => s === "true" || s === "on")], { error: "muted must be true or false" }),
});

export const ZSheetParam = z.enum(CHECK_SHEETS, { error: "Sheet must be surfaces or duct_runs" });
export const ZRowParams = z.object({ projectId: z.uuid({ error: "Project id must be a UUID" }), itemId: z.uuid({ error: "Row id must be a UUID" }) });
export const ZRevisionParams = z.object({
  projectId: z.uuid({ error: "Project id must be a UUID" }),
  letter: z.string().regex(/^[A-Z]{1,4}$/, "A revision is named by capital letters (A, B, … AA)"),
});
const ZLetter = z.string({ error: "Name two revisions, e.g. from=A&to=B" }).regex(/^[A-Z]{1,4}$/, "A revision is named by capital letters (A, B, … AA)");
export const ZCompareQuery = z.object({ from: ZLetter, to: ZLetter });

// A filter toggle in the address: present and "yes" (or "1", "true") when on.
const ZToggle = z
  .enum(["yes", "1", "true", "no", "0", "false"], { error: "must be yes or no" })
  .transform((v) => v === "yes" || v === "1" || v === "true")
  .optional();
export const ZBoardQuery = z.object({
  state: z.enum(CHECK_STATES, { error: `state must be one of ${CHECK_STATES.join(", ")}` }).optional(),
  sheet: ZSheetParam.optional(),
  /** Rows with a warning or an error in any design case. */
  warnings: ZToggle,
  /** Rows accepted once and sent back to unchecked (or queried) since by a change. */
  changed: ZToggle,
});
export type TBoardFilter = z.infer<typeof ZBoardQuery>;
export const ZWorkingQuery = z.object({ case: z.uuid({ error: "case must be a design case id" }).optional() });
export const ZHistoryQuery = z.object({
  before: z.coerce.number({ error: "before must be a history entry id" }).int().positive().optional(),
  limit: z.coerce.number({ error: "limit must be a number" }).int().min(1, "limit is at least 1").max(200, "limit is at most 200").default(50),
});

/** Rows accepted together, each at the version the checker read: "surfaces:<id>:<version>" in forms. */
const ZRowAtVersion = z.object({ sheet: ZSheetParam, id: z.uuid({ error: "Row id must be a UUID" }), row_version: ZRowVersion });
/**
 * Several rows accepted at once: the checker was shown the filter that listed them and confirmed
 * their number ("Accept 37 rows shown by filter …?"). Both are required and recorded with each
 * row's acceptance; a count that is not the number of rows sent means the list changed under the
 * checker, and nothing is accepted.
 */
export const ZAcceptRows = z
  .object({
    rows: z.preprocess(
      (v) => (Array.isArray(v) ? v.map((r) => (typeof r === "string" ? Object.fromEntries(["sheet", "id", "row_version"].map((k, i) => [k, r.split(":")[i]])) : r)) : v),
      z.array(ZRowAtVersion, { error: "rows must be a list of rows" }).min(1, "Choose at least one row").max(10_000, "At most 10,000 rows at once"),
    ),
    filter: text("filter", 300).min(1, "filter is required: the filter that listed these rows, as shown to the checker"),
    confirmed_count: z.coerce
      .number({ error: "confirmed_count is required: the number of rows the checker confirmed" })
      .int("confirmed_count must be a whole number")
      .positive("confirmed_count must be a positive whole number"),
  })
  .superRefine((v, ctx) => {
    if (v.confirmed_count !== v.rows.length) {
      ctx.addIssue({ code: "custom", path: ["confirmed_count"], message: `confirmed_count is ${v.confirmed_count} but ${v.rows.length} ${v.rows.length === 1 ? "row was" : "rows were"} sent: confirm the rows shown again` });
    }
  });
export type TAcceptRows = z.infer<typeof ZAcceptRows>;
