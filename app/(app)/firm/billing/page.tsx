import type { Metadata } from "next";
import { hasAnyRole } from "@/server/auth/actor";
import { requirePageActor } from "@/server/auth/get-viewer";
import { getBillingOverview } from "@/server/billing/get-billing-overview";
import { BillingView } from "./billing-view";

export const metadata: Metadata = { title: "Billing" };

export default async function BillingPage({ searchParams }: { searchParams: Promise<{ checkout?: string }> }) {
  const actor = await requirePageActor("/firm/billing");
  const { checkout } = await searchParams;
  const overview = hasAnyRole(actor, ["admin"]) ? await getBillingOverview(actor) : null;
  return <BillingView overview={overview} checkout={checkout === "done" || checkout === "cancelled" ? checkout : null} />;
}
