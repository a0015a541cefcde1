import { route } from "@/lib/server/http/route";
import { getPreferences } from "@/lib/server/notifications/get-preferences";
import { updatePreferences } from "@/lib/server/notifications/update-preferences";
import { ZNotificationPreferences } from "@/lib/validation/notifications";

export const GET = route({ can: "me.read" }, ({ actor }) => getPreferences(actor));

export const PUT = route({ can: "me.read", body: ZNotificationPreferences }, ({ actor, body }) => updatePreferences(actor, body));
