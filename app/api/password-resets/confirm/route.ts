// POST /api/password-resets/confirm: set a new password with the token from the e-mail (public).
import { ZPasswordResetConfirm } from "@/schemas/auth";
import { route } from "@/server/http/route";
import { resetPassword } from "@/server/services/reset-password";

export const POST = route({ auth: "public", body: ZPasswordResetConfirm }, ({ body }) => resetPassword(body));
