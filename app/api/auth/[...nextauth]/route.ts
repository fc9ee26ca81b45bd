// GET/POST /api/auth/*: Auth.js (sign-in, callbacks, magic links, session, sign-out), inside route()
// so that its posts get the same cross-site check and error mapping as every other handler.
import type { NextRequest } from "next/server";
import { handlers } from "@/server/auth/auth";
import { route } from "@/server/http/route";

export const GET = route({ auth: "public" }, ({ req }) => handlers.GET(req as NextRequest));
export const POST = route({ auth: "public" }, ({ req }) => handlers.POST(req as NextRequest));
