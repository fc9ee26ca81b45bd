// PUT /api/firm/billing/seats {seats}: change the seat quantity of the firm's subscription (admin).
import { ZSeats } from "@/schemas/billing";
import { changeSeats } from "@/server/billing/change-seats";
import { route } from "@/server/http/route";

export const PUT = route({ roles: ["admin"], body: ZSeats }, ({ actor, body }) => changeSeats(actor, body));
