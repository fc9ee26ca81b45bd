// GET: a project's issued revisions (everyone, viewers included). POST: a checker issues the next.
import { ZIssueRevision } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { issueRevision } from "@/server/services/issue-revision";
import { listRevisions } from "@/server/services/list-revisions";

export const GET = route({ params: ZProjectParams }, async ({ actor, params }) => ({ revisions: await listRevisions(actor, params.projectId) }));
export const POST = route({ roles: ["checker"], params: ZProjectParams, body: ZIssueRevision }, async ({ actor, params, body }) =>
  Response.json(await issueRevision(actor, params.projectId, body), { status: 201 }),
);
