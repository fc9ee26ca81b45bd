"use server";
// Server actions of the billing page: the same services as /api/firm/billing/…, through action().
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { ZSeats } from "@/schemas/billing";
import { changeSeats } from "@/server/billing/change-seats";
import { openBillingPortal } from "@/server/billing/open-billing-portal";
import { startCheckout } from "@/server/billing/start-checkout";
import { action } from "@/server/http/action";

const admin = ["admin"] as const;

/** Off to Stripe Checkout (the stand-in's page locally); the webhook makes the firm paid. */
export const buySeatsAction = action({ roles: admin, input: ZSeats }, async ({ actor, input }) => {
  const { url } = await startCheckout(actor, input);
  redirect(url);
});

export const changeSeatsAction = action({ roles: admin, input: ZSeats }, async ({ actor, input }) => {
  const { seats } = await changeSeats(actor, input);
  revalidatePath("/firm", "layout");
  return { ok: true, message: `Seats changed to ${seats}; the difference is prorated on the next invoice` };
});

export const openPortalAction = action({ roles: admin }, async ({ actor }) => {
  const { url } = await openBillingPortal(actor);
  redirect(url);
});
