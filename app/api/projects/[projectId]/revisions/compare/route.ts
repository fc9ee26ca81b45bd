// GET ?from=A&to=B: rows added, removed and changed between two issued revisions, and every zone total's change.
import { ZCompareQuery } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { compareProjectRevisions } from "@/server/services/compare-project-revisions";

export const GET = route({ params: ZProjectParams, query: ZCompareQuery }, ({ actor, params, query }) => compareProjectRevisions(actor, params.projectId, query.from, query.to));
