import type { Metadata } from "next";
import { draftOnly, type DraftPageProps } from "./_checking/draft-only";
import { ScheduleView } from "./schedule-view";

export const metadata: Metadata = { title: "Schedule" };

// ?sheet=…&case=… open the schedule where a row's working was opened from (its Back link).
export default async function SchedulePage({ params, searchParams }: DraftPageProps & { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  await draftOnly(params);
  const q = await searchParams;
  const sheet = q.sheet === "duct_runs" ? "duct_runs" : "surfaces";
  return <ScheduleView initialSheet={sheet} initialCase={typeof q.case === "string" ? q.case : undefined} />;
}
