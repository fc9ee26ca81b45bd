// GET /api/firm/billing: plan, seats, price, next invoice and invoices of the current firm (admin).
import { getBillingOverview } from "@/server/billing/get-billing-overview";
import { route } from "@/server/http/route";

export const GET = route({ roles: ["admin"] }, ({ actor }) => getBillingOverview(actor));
