import { route } from "@/lib/server/http/route";
import { removeRung } from "@/lib/server/ladders/remove-rung";
import { updateRung } from "@/lib/server/ladders/update-rung";
import { ZRungPatch } from "@/lib/validation/ladders";

export const PATCH = route({ can: "ladders.write", body: ZRungPatch }, ({ actor, params, body }) =>
  updateRung(actor, params.id!, body),
);

/** Archives a rung that has history (positions, logs, promotions), deletes an unused one; 204 either way. */
export const DELETE = route({ can: "ladders.write" }, async ({ actor, params }) => {
  await removeRung(actor, params.id!);
});
