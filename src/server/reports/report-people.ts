import "server-only";
import type { Knex } from "knex";
import { userNames, type RowCheck } from "@/server/repositories/row-checks";

/** Who a draft report names on its cover, and whether every row has been accepted. */
export interface ReportPeople {
  /** Whoever last edited the rows; when nobody is recorded, the firm's consultants. */
  author: string;
  /** The checkers who accepted rows; null when none has. */
  checker: string | null;
  allAccepted: boolean;
}

/**
 * The people of a draft report from the rows' checks: "Prepared by" is who last edited the rows
 * (not whoever asks for the report, often the checker), "Checked by" who accepted them.
 */
export async function reportPeople(q: Knex, firmId: string, projectId: string, rowCount: number, fallback: string): Promise<ReportPeople> {
  const stored: RowCheck[] = await q("row_checks").where({ firm_id: firmId, project_id: projectId }).select();
  const names = await userNames(q, stored.flatMap((c) => [c.checked_by, c.last_edited_by]));
  const distinct = (ids: (number | null)[]) => [...new Set(ids.flatMap((id) => (id === null ? [] : [names.get(id)])).filter((n): n is string => n !== undefined))].sort();
  let authors = distinct(stored.map((c) => c.last_edited_by));
  if (authors.length === 0) {
    const consultants: { name: string | null; email: string }[] = await q("memberships as m")
      .join("users as u", "u.id", "m.user_id")
      .where({ "m.firm_id": firmId, "m.role": "consultant" })
      .orderBy("u.id")
      .select("u.name", "u.email");
    authors = consultants.map((u) => u.name ?? u.email);
  }
  const accepted = stored.filter((c) => c.state === "accepted");
  const checkers = distinct(accepted.map((c) => c.checked_by));
  return {
    author: authors.length > 0 ? authors.join(", ") : fallback,
    checker: checkers.length > 0 ? checkers.join(", ") : null,
    allAccepted: rowCount > 0 && accepted.length >= rowCount,
  };
}
