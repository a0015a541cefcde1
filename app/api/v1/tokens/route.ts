import { route } from "@/lib/server/http/route";
import { createToken } from "@/lib/server/tokens/create-token";
import { listTokens } from "@/lib/server/tokens/list-tokens";
import { ZCreateToken } from "@/lib/validation/auth";

export const GET = route({ can: "tokens.manage" }, ({ actor }) => listTokens(actor));

export const POST = route({ can: "tokens.manage", body: ZCreateToken, status: 201 }, ({ actor, body }) =>
  createToken(actor, body),
);
