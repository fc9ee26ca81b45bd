// GET /api/firm/members: members, their roles and the seats in use (firm admin).
import { route } from "@/server/http/route";
import { listMembers } from "@/server/services/list-members";

export const GET = route({ roles: ["admin"] }, ({ actor }) => listMembers(actor));
