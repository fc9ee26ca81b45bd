import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { db } from "@/server/db/knex";
import { seatUsage } from "@/server/repositories/firms";
import { FirmView } from "./firm-view";

export const metadata: Metadata = { title: "Firm" };

export default async function FirmPage() {
  const actor = await requirePageActor("/firm");
  return <FirmView actor={actor} seats={await seatUsage(db(), actor.firm.id)} isAdmin={hasAnyRole(actor, ["admin"])} />;
}
