// GET: one issued revision with its frozen snapshot. There is deliberately no PATCH, PUT or
// DELETE: an issued revision never changes (the database refuses it too).
import { ZRevisionParams } from "@/schemas/checking";
import { route } from "@/server/http/route";
import { getRevisionOrThrow } from "@/server/services/get-revision";

export const GET = route({ params: ZRevisionParams }, ({ actor, params }) => getRevisionOrThrow(actor, params.projectId, params.letter));
