// POST /api/sign-up: create a firm and its first member, the firm admin (public).
import { ZSignUp } from "@/schemas/auth";
import { route } from "@/server/http/route";
import { signUpFirm } from "@/server/services/sign-up-firm";

export const POST = route({ auth: "public", body: ZSignUp }, async ({ body }) => Response.json(await signUpFirm(body), { status: 201 }));
