import { route } from "@/lib/server/http/route";
import { duplicateLadder } from "@/lib/server/ladders/duplicate-ladder";
import { ZDuplicateLadder } from "@/lib/validation/ladders";

export const POST = route({ can: "ladders.write", body: ZDuplicateLadder, status: 201 }, ({ actor, params, body }) =>
  duplicateLadder(actor, params.id!, body),
);
