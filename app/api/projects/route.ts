// GET /api/projects: the current firm's projects (any role). POST: create one (consultant).
import { ZProjectCreate } from "@/schemas/project";
import { route } from "@/server/http/route";
import { createProject } from "@/server/services/create-project";
import { listProjects } from "@/server/services/list-projects";

export const GET = route({}, async ({ actor }) => ({ projects: await listProjects(actor) }));
export const POST = route({ roles: ["consultant"], body: ZProjectCreate }, async ({ actor, body }) =>
  Response.json(await createProject(actor, body), { status: 201 }),
);
