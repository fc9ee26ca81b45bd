// POST: a consultant asks the firm's checkers to check the project (one e-mail each).
import { ZCheckRequest } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { requestCheck } from "@/server/services/request-check";

export const POST = route({ roles: ["consultant"], params: ZProjectParams, body: ZCheckRequest }, async ({ actor, params, body }) =>
  Response.json(await requestCheck(actor, params.projectId, body), { status: 201 }),
);
