// POST /api/firm/billing/checkout {seats}: a Stripe Checkout address to buy a seat subscription (admin).
import { ZSeats } from "@/schemas/billing";
import { startCheckout } from "@/server/billing/start-checkout";
import { route } from "@/server/http/route";

export const POST = route({ roles: ["admin"], body: ZSeats }, async ({ actor, body }) => Response.json(await startCheckout(actor, body), { status: 201 }));
