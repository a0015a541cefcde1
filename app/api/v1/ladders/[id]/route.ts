import { route } from "@/lib/server/http/route";
import { archiveLadder } from "@/lib/server/ladders/archive-ladder";
import { getLadder } from "@/lib/server/ladders/get-ladder";
import { updateLadder } from "@/lib/server/ladders/update-ladder";
import { ZLadderPatch } from "@/lib/validation/ladders";

export const GET = route({ can: "ladders.read" }, ({ actor, params }) => getLadder(actor, params.id!));

export const PATCH = route({ can: "ladders.write", body: ZLadderPatch }, ({ actor, params, body }) =>
  updateLadder(actor, params.id!, body),
);

/** Archives (never deletes): athletes keep their place; PATCH { archived: false } restores. */
export const DELETE = route({ can: "ladders.write" }, ({ actor, params }) => archiveLadder(actor, params.id!));
