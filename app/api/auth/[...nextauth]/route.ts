// GET/POST /api/auth/*: Auth.js (sign-in, callbacks, magic links, session, sign-out), inside route()
// so that its posts get the same cross-site check and error mapping as every other handler.
import { NextRequest } from "next/server";
import { handlers } from "@/server/auth/auth";
import { readCappedBody } from "@/server/http/read-bytes";
import { route } from "@/server/http/route";

// Auth.js's posts are small forms (an e-mail, a password, a CSRF token); anyone can send them, so
// the body is read through a 64 KB cap (413 beyond it) and Auth.js gets a request rebuilt from it.
const MAX_AUTH_BODY_BYTES = 64 * 1024;

export const GET = route({ auth: "public" }, ({ req }) => handlers.GET(req as NextRequest));
export const POST = route({ auth: "public" }, async ({ req }) => {
  const body = await readCappedBody(req, MAX_AUTH_BODY_BYTES, "Sign-in request");
  return handlers.POST(new NextRequest(req.url, { method: "POST", headers: req.headers, body: body as BodyInit }));
});
