// GET / PUT {muted}: whether the signed-in member receives e-mail about this project.
import { ZNotificationMute } from "@/schemas/checking";
import { ZProjectParams } from "@/schemas/project";
import { route } from "@/server/http/route";
import { getNotificationMute } from "@/server/services/get-notification-mute";
import { setNotificationMute } from "@/server/services/set-notification-mute";

export const GET = route({ params: ZProjectParams }, ({ actor, params }) => getNotificationMute(actor, params.projectId));
export const PUT = route({ params: ZProjectParams, body: ZNotificationMute }, ({ actor, params, body }) => setNotificationMute(actor, params.projectId, body.muted));
