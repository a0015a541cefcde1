import { route } from "@/lib/server/http/route";
import { revokeToken } from "@/lib/server/tokens/revoke-token";

export const DELETE = route({ can: "tokens.manage" }, ({ actor, params }) => revokeToken(actor, params.id!));
