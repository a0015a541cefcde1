import { deleteBlock } from "@/lib/server/blocks/delete-block";
import { getBlock } from "@/lib/server/blocks/get-block";
import { updateBlock } from "@/lib/server/blocks/update-block";
import { route } from "@/lib/server/http/route";
import { ZUpdateBlock } from "@/lib/validation/blocks";

export const GET = route({ can: "blocks.read" }, ({ actor, params }) => getBlock(actor, params.id!));

export const PATCH = route({ can: "blocks.write", body: ZUpdateBlock }, ({ actor, params, body }) => updateBlock(actor, params.id!, body));

export const DELETE = route({ can: "blocks.write" }, ({ actor, params }) => deleteBlock(actor, params.id!));
