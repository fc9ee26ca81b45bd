// GET /api/me/preferences: the signed-in person's own view settings in the current firm.
// PATCH: change some of them (units shown, folded zone totals, column sets). A person's view,
// never a change to a project: no history, no audit, no row marked as edited.
import { ZPreferencesUpdate } from "@/schemas/preferences";
import { route } from "@/server/http/route";
import { getPreferences } from "@/server/services/get-preferences";
import { updatePreferences } from "@/server/services/update-preferences";

export const GET = route({}, ({ actor }) => getPreferences(actor));

export const PATCH = route({ body: ZPreferencesUpdate, maxBodyBytes: 100_000 }, ({ actor, body }) => updatePreferences(actor, body));
