// GET /api/me: who is calling (person or token), for which firm and with which roles.
import { route } from "@/server/http/route";

export const GET = route({}, ({ actor }) => ({
  via: actor.via,
  user: actor.userId === null ? null : { id: actor.userId, name: actor.name, email: actor.email },
  firm: actor.firm,
  roles: actor.roles,
}));
