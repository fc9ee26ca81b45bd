import type { Metadata } from "next";
import { draftOnly, type DraftPageProps } from "./_checking/draft-only";
import { ScheduleView } from "./schedule-view";

export const metadata: Metadata = { title: "Schedule" };

export default async function SchedulePage({ params }: DraftPageProps) {
  await draftOnly(params);
  return <ScheduleView />;
}
