import { route } from "@/lib/server/http/route";
import { addRung } from "@/lib/server/ladders/add-rung";
import { ZRungInput } from "@/lib/validation/ladders";

export const POST = route({ can: "ladders.write", body: ZRungInput, status: 201 }, ({ actor, params, body }) =>
  addRung(actor, params.id!, body),
);
