// GET /api/projects: the current firm's projects in use (any role; ?archived=1 the archived
// ones). POST: create one (consultant).
import { ZProjectCreate, ZProjectListQuery } from "@/schemas/project";
import { route } from "@/server/http/route";
import { createProject } from "@/server/services/create-project";
import { listProjects } from "@/server/services/list-projects";

export const GET = route({ query: ZProjectListQuery }, async ({ actor, query }) => ({ projects: await listProjects(actor, { archived: query.archived === "1" }) }));
export const POST = route({ roles: ["consultant"], body: ZProjectCreate }, async ({ actor, body }) =>
  Response.json(await createProject(actor, body), { status: 201 }),
);
