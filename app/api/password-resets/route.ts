// POST /api/password-resets: e-mail a reset link; the same answer whether or not the address has an account (public).
import { ZPasswordResetRequest } from "@/schemas/auth";
import { route } from "@/server/http/route";
import { requestPasswordReset } from "@/server/services/request-password-reset";

export const POST = route({ auth: "public", body: ZPasswordResetRequest }, async ({ body }) => Response.json(await requestPasswordReset(body.email), { status: 202 }));
