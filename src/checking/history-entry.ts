/** One row of a project's audit trail, as the API answers and the history panels show it. */
export interface THistoryEntry {
  id: number;
  at: string;
  actor_name: string;
  /** The table or concept changed: "surfaces", "project", "row_check", "revision" … */
  entity: string;
  entity_id: string;
  action: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}
