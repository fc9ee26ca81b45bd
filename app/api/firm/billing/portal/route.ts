// POST /api/firm/billing/portal: a Stripe billing-portal address for the firm's card and invoices (admin).
import { openBillingPortal } from "@/server/billing/open-billing-portal";
import { route } from "@/server/http/route";

export const POST = route({ roles: ["admin"] }, async ({ actor }) => Response.json(await openBillingPortal(actor), { status: 201 }));
