// GET /api/health: liveness of the app and its database, for load balancers and `npm start`.
import { route } from "@/server/http/route";
import { checkDatabase } from "@/server/services/check-database";

export const GET = route({ auth: "public" }, async () => {
  const db = await checkDatabase();
  const up = db === "ok";
  return Response.json({ status: up ? "ok" : "error", db }, { status: up ? 200 : 503, headers: { "cache-control": "no-store" } });
});
